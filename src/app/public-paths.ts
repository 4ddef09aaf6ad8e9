/** Pages that work without an account: a 401 on them does not send the user to the sign-in page. */
const PUBLIC = [/^\/sign-in/, /^\/reset-password/, /^\/invitations\/accept/, /^\/examples/];

export const isPublicPath = (path: string) => PUBLIC.some((re) => re.test(path));
