/**
 * Notices to a project's engineers: the members whose project role may push runs (engineers
 * and project admins), accounts not disabled. Sending never throws: each failed message is
 * logged and counted, so the action that caused the notice still succeeds.
 */
import type { ResolvedDeps } from '../app-deps';
import { projectRightsOf } from '../auth/rights';
import { Membership } from '../db/models/membership.model';
import { Project } from '../db/models/project.model';
import type { Run } from '../db/models/run.model';
import { Study } from '../db/models/study.model';
import { User } from '../db/models/user.model';
import type { MailMessage } from './mailer';
import { checksFailedMail, runPushedMail, type FailedCheck } from './notify-mail';

export type { FailedCheck } from './notify-mail';

/** What notices need from the app's deps. */
export type NotifyDeps = Pick<ResolvedDeps, 'mailer' | 'logger' | 'config'>;

export interface NotifyOutcome {
  /** Addresses the mailer accepted a message for. */
  recipients: string[];
  /** Addresses whose message failed (logged). */
  failed: string[];
}

/** Members of the project who may push runs, optionally without one user (who caused the notice). */
export async function projectEngineers(projectId: number, except?: number | null): Promise<User[]> {
  const members = await Membership.findAll({ where: { projectId }, include: [{ model: User, as: 'user' }], order: [['id', 'ASC']] });
  return members
    .filter((m) => projectRightsOf(m.role).has('runs:push') && m.user && !m.user.disabled && m.userId !== except)
    .map((m) => m.user!);
}

async function deliver(deps: NotifyDeps, users: readonly User[], make: (u: User) => MailMessage, what: string): Promise<NotifyOutcome> {
  const out: NotifyOutcome = { recipients: [], failed: [] };
  for (const u of users) {
    try {
      await deps.mailer.send(make(u));
      out.recipients.push(u.email);
    } catch (err) {
      deps.logger.error('notice not sent', { what, to: u.email, error: err });
      out.failed.push(u.email);
    }
  }
  return out;
}

/**
 * Tell the project's engineers (not the pusher) that a run was pushed. Call it once, when the
 * run is created. Resolves when every message was handed to the mailer; never throws.
 */
export async function notifyRunPushed(deps: NotifyDeps, run: Run): Promise<NotifyOutcome> {
  try {
    const [project, study, pusher] = await Promise.all([
      Project.findByPk(run.projectId), Study.findByPk(run.studyId), run.pushedBy ? User.findByPk(run.pushedBy) : null,
    ]);
    if (!project) return { recipients: [], failed: [] };
    const notice = {
      projectName: project.name, studyName: study?.name ?? `study ${run.studyId}`, pushedBy: pusher?.name ?? 'Someone',
      variants: run.variantCount ?? 0, status: run.status, gitCommit: run.gitCommit,
      link: `${deps.config.publicUrl}/projects/${project.slug}/runs/${run.runId}`,
    };
    const users = await projectEngineers(project.id, run.pushedBy);
    return await deliver(deps, users, (u) => runPushedMail(u.email, notice), 'run pushed');
  } catch (err) {
    deps.logger.error('run notice failed', { runId: run.runId, error: err });
    return { recipients: [], failed: [] };
  }
}

/** Tell the project's engineers (the pusher included) which reference cases started failing. */
export async function notifyChecksFailed(deps: NotifyDeps, project: Project, failures: readonly FailedCheck[], pushedBy: User): Promise<NotifyOutcome> {
  try {
    const link = `${deps.config.publicUrl}/projects/${project.slug}/reference-cases`;
    const users = await projectEngineers(project.id);
    return await deliver(deps, users, (u) => checksFailedMail(u.email, project.name, failures, pushedBy.name, link), 'checks failed');
  } catch (err) {
    deps.logger.error('check notice failed', { projectId: project.id, error: err });
    return { recipients: [], failed: [] };
  }
}
