/** Comments on a variant: anyone who sees the project reads them; comments:write adds one. */
import { Comment } from '../db/models/comment.model';
import { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { findVariantRow } from './variants.service';

export interface PublicComment {
  id: number;
  body: string;
  /** null once the account is deleted. */
  author: { id: number; name: string } | null;
  createdAt: Date;
}

const publicComment = (c: Comment, author: User | null | undefined): PublicComment => ({
  id: c.id, body: c.body, author: author ? { id: author.id, name: author.name } : null, createdAt: c.createdAt,
});

/** The variant's comments, oldest first. */
export async function listComments(access: ProjectAccess, runId: string, index: string): Promise<PublicComment[]> {
  const v = await findVariantRow(access, runId, index);
  const rows = await Comment.findAll({
    where: { variantPk: v.id }, include: [{ model: User, as: 'author', attributes: ['id', 'name'] }], order: [['createdAt', 'ASC'], ['id', 'ASC']],
  });
  return (rows as (Comment & { author?: User | null })[]).map((c) => publicComment(c, c.author));
}

export async function addComment(access: ProjectAccess, user: User, runId: string, index: string, body: string): Promise<PublicComment> {
  const v = await findVariantRow(access, runId, index);
  const c = await Comment.create({ variantPk: v.id, userId: user.id, body: body.trim() });
  return publicComment(c, user);
}
