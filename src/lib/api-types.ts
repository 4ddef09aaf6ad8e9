/**
 * What the web app reads from the team server under /api: accounts, projects, tokens,
 * invitations, password resets, mail, reference cases and uploads, in the shapes
 * server/controllers and server/services answer. Timestamps are ISO 8601 strings as JSON
 * carries them. Studies, runs and variants are in run-types.ts.
 */

export type Timestamp = string;
export type Role = 'admin' | 'engineer' | 'reviewer' | 'viewer';
export type ProjectRight =
  | 'project:read' | 'project:admin' | 'members:invite' | 'tokens:manage' | 'runs:push'
  | 'cases:freeze' | 'variants:mark' | 'variants:reject' | 'comments:write' | 'uploads:write' | 'checks:push';

export interface PublicUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  createdAt: Timestamp;
}

export interface PublicProject {
  slug: string;
  name: string;
  description: string;
  createdAt: Timestamp;
  /** The caller's role; null when seen through the admin's access to every project. */
  role: Role | null;
}

/** GET /api/projects/:slug: the project with the caller's rights in it. */
export interface ProjectDetail extends PublicProject {
  rights: ProjectRight[];
}

/** GET /api/auth/me. */
export interface Me {
  user: PublicUser;
  via: 'cookie' | 'bearer' | 'api-token';
  projects: PublicProject[];
  token?: { name: string; prefix: string; scopes: string[] };
}

/** POST /api/auth/sign-in (the session is also set as an httpOnly cookie). */
export interface SignInResult {
  user: PublicUser;
  token: string;
  /** Seconds. */
  expiresIn: number;
}

/** POST /api/invitations/accept: the person is signed in and a member of the project. */
export interface InvitationAccepted {
  user: PublicUser;
  project: { slug: string; name: string };
  role: Role;
  token: string;
}

export interface ApiTokenInfo {
  id: number;
  name: string;
  /** The public part of the token, shown in lists: pp_<prefix>_… */
  prefix: string;
  scopes: ProjectRight[];
  owner: { id: number; name: string };
  createdAt: Timestamp;
  lastUsedAt: Timestamp | null;
  revokedAt: Timestamp | null;
}

/** POST /api/projects/:slug/tokens: the secret `token` is in this answer only. */
export interface CreatedToken extends ApiTokenInfo {
  token: string;
}

export interface UserPatch {
  name?: string;
  role?: Role;
  disabled?: boolean;
}

/** A message kept by the development mail sink (GET /api/admin/mail, newest first). */
export interface CapturedMail {
  id: number;
  from: string | null;
  /** Envelope recipients. */
  to: string[];
  subject: string;
  text: string;
  receivedAt: Timestamp;
}

/** GET /api/admin/mail/:id. */
export interface CapturedMailDetail extends CapturedMail {
  messageId: string | null;
  toHeader: string | null;
  html: string | null;
  headers: { name: string; value: string }[];
}

export type CheckStatus = 'pass' | 'drift' | 'invalid' | 'error';

export interface LatestCheck {
  status: CheckStatus;
  gitCommit: string | null;
  createdAt: Timestamp;
}

export interface ReferenceCaseSummary {
  id: number;
  name: string;
  description: string | null;
  /** `{ kind, citation }` of the case file. */
  source: unknown;
  frozenBy: { id: number; name: string } | null;
  createdAt: Timestamp;
  latest: LatestCheck | null;
}

export interface ReferenceCaseDetail extends ReferenceCaseSummary {
  /** The reference case file (shared/schemas/reference-case.ts). */
  body: unknown;
}

/** One recorded check of a reference case (GET …/checks, newest first). */
export interface CheckRecord {
  id: number;
  caseId: number;
  caseName: string;
  status: CheckStatus;
  file: string | null;
  gitCommit: string | null;
  details: unknown;
  pushedBy: { id: number; name: string } | null;
  createdAt: Timestamp;
}

export type UploadKind = 'study' | 'model' | 'dxf';

export interface UploadInfo {
  id: number;
  kind: UploadKind;
  /** The name the file was uploaded with. */
  name: string;
  /** Bytes. */
  size: number;
  contentType: string;
  createdBy: { id: number; name: string } | null;
  createdAt: Timestamp;
}

/** POST …/uploads: the stored file, what the server read from it, and warnings by path. */
export interface CreatedUpload {
  upload: UploadInfo;
  summary: Record<string, unknown>;
  warnings: { path: string; message: string }[];
}
