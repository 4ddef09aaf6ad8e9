/**
 * A PanelpointApi with an invented demo behind it, for `VITE_FAKE_API=1 npx vite` only (screenshots
 * and trying pages before the team server runs). Signed in as Ellis Engineer at first; every demo
 * account signs in with DEMO_PASSWORD. Nothing here is loaded in a production build.
 */
import type { PanelpointApi, RunRef } from '@/lib/api';
import type { ApiTokenInfo, CreatedToken, ProjectDetail, PublicUser } from '@/lib/api-types';
import { ApiError } from '@/lib/api-client';
import { DEMO_PASSWORD, GRANTS, PROJECTS, USERS } from './demo-accounts';
import { demoCases, demoChecks, demoMail, demoUploads } from './demo-records';
import {
  RUNS, STUDIES, addComment, commentsOf, findRun, marksOf, rowWithMarks, runDetail, runSummary, setMark, storeOf, studyProject, variantDetail,
} from './fake-runs';
import { aggregate, filtered, points, sorted } from './run-query';

const KEY = 'panelpoint.fake.user';
const pause = (ms = 60) => new Promise((r) => setTimeout(r, ms));
const hex = (n: number) => Array.from(crypto.getRandomValues(new Uint8Array(n)), (b) => b.toString(16).padStart(2, '0')).join('');

export function createFakeApi(opts: { onUnauthorized?: () => void } = {}): PanelpointApi {
  let userId = Number(sessionStorage.getItem(KEY) ?? 2);
  const users = USERS.map((u) => ({ ...u }));
  const cases = demoCases();
  const checks = demoChecks(cases);
  for (const c of cases) {
    const latest = checks.find((k) => k.caseId === c.id);
    c.latest = latest ? { status: latest.status, gitCommit: latest.gitCommit, createdAt: latest.createdAt } : null;
  }
  const uploads = demoUploads().map((u) => ({ ...u, url: URL.createObjectURL(new Blob([u.content], { type: u.info.contentType })) }));
  const mail = demoMail();
  const tokens: ApiTokenInfo[] = [
    { id: 1, name: 'ci-main', prefix: '4be1c09d7a3f', scopes: ['project:read', 'runs:push', 'checks:push'], owner: { id: 2, name: 'Ellis Engineer' }, createdAt: '2025-02-03T10:00:00.000Z', lastUsedAt: '2025-02-19T02:10:00.000Z', revokedAt: null },
    { id: 2, name: 'old laptop', prefix: '91c3e5a7b2d4', scopes: ['project:read', 'runs:push'], owner: { id: 2, name: 'Ellis Engineer' }, createdAt: '2025-01-10T08:00:00.000Z', lastUsedAt: '2025-01-30T17:45:00.000Z', revokedAt: '2025-02-01T09:00:00.000Z' },
  ];

  const me = (): PublicUser => {
    const u = users.find((x) => x.id === userId);
    if (!u) {
      opts.onUnauthorized?.();
      throw new ApiError(401, 'unauthenticated', 'Sign in first.');
    }
    return u;
  };
  const project = (slug: string): ProjectDetail => {
    const u = me();
    const p = PROJECTS.find((x) => x.slug === slug);
    if (!p) throw new ApiError(404, 'project-not-found', 'No such project, or you are not a member.');
    return { ...p, role: u.role, rights: GRANTS[u.role] };
  };
  const need = (slug: string, right: string) => {
    if (!project(slug).rights.includes(right as never)) throw new ApiError(403, 'forbidden', `You do not have the right ${right} in this project.`);
  };
  const run = (ref: RunRef) => {
    project(ref.slug);
    return findRun(ref.slug, ref.runId);
  };
  const marked = (ref: RunRef) => {
    const r = findRun(ref.slug, ref.runId);
    return (index: number) => marksOf(r, index).map((m) => m.kind);
  };
  const api: PanelpointApi = {
    async signIn({ email, password }) {
      await pause(300);
      const u = users.find((x) => x.email === email.toLowerCase());
      if (!u || password !== DEMO_PASSWORD) throw new ApiError(401, 'wrong-credentials', 'Wrong email or password.');
      if (u.disabled) throw new ApiError(403, 'account-disabled', 'This account is disabled; ask an administrator.');
      userId = u.id;
      sessionStorage.setItem(KEY, String(u.id));
      return { user: u, token: 'fake-session', expiresIn: 86_400 };
    },
    async signOut() { userId = 0; sessionStorage.setItem(KEY, '0'); },
    async getMe() { await pause(); const u = me(); return { user: u, via: 'cookie', projects: PROJECTS.map((p) => ({ ...p, role: u.role })) }; },
    async requestPasswordReset() { await pause(300); return { message: 'If an account has this email, a reset link is on its way.' }; },
    async confirmPasswordReset({ token }) { await pause(300); if (token.length < 20) throw new ApiError(400, 'link-invalid', 'This password reset link is not valid, was already used or has expired; ask for a new one.'); },
    async acceptInvitation() { await pause(300); throw new ApiError(400, 'link-invalid', 'This invitation link is not valid, was already used or has expired; ask for a new one.'); },

    async getProjects() { await pause(); const u = me(); return PROJECTS.map((p) => ({ ...p, role: u.role })); },
    async getProject(slug) { await pause(); return project(slug); },
    async getStudies(slug) { await pause(); project(slug); return STUDIES.filter((s) => studyProject(s.id) === slug).map(({ body: _b, ...s }) => s); },
    async getStudy(slug, id) { await pause(); project(slug); const s = STUDIES.find((x) => String(x.id) === id && studyProject(x.id) === slug); if (!s) throw new ApiError(404, 'study-not-found', 'No such study.'); return s; },
    async getRuns(slug, f) { await pause(); project(slug); return RUNS.filter((r) => r.project === slug && (!f?.study || String(r.study.id) === f.study)).map(runSummary); },
    async getRun(ref) { await pause(); return runDetail(run(ref)); },

    async getVariants(ref, q) {
      await pause(120);
      const r = run(ref);
      const s = storeOf(r);
      const rows = sorted(s, filtered(s, q, marked(ref)), q.sort);
      const size = Math.min(q.pageSize, 500);
      return { total: rows.length, page: q.page, pageSize: size, items: rows.slice((q.page - 1) * size, q.page * size).map((j) => rowWithMarks(r, j)) };
    },
    variantsCsvUrl: (ref) => URL.createObjectURL(new Blob([`index,status\n# fake demo: the team server streams the real CSV of run ${ref.runId}\n`], { type: 'text/csv' })),
    async getPoints(ref, q) { await pause(150); return points(storeOf(run(ref)), q); },
    async getAggregate(ref, q) { await pause(150); return aggregate(storeOf(run(ref)), q); },
    async getVariant(ref, index) { await pause(150); return variantDetail(run(ref), index); },
    async setMark(ref, index, kind) { await pause(); need(ref.slug, kind === 'candidate' ? 'variants:mark' : 'variants:reject'); setMark(run(ref), index, me().id, kind); },
    async clearMark(ref, index) { await pause(); setMark(run(ref), index, me().id, null); },
    async getComments(ref, index) { await pause(); return commentsOf(run(ref), index); },
    async addComment(ref, index, body) { await pause(); need(ref.slug, 'comments:write'); const u = me(); return addComment(run(ref), index, { id: u.id, name: u.name }, body); },

    async getCases(slug) { await pause(); project(slug); return cases.map(({ body: _b, ...c }) => c); },
    async getCase(slug, id) { await pause(); project(slug); const c = cases.find((x) => String(x.id) === id); if (!c) throw new ApiError(404, 'case-not-found', 'No such case.'); return c; },
    async getChecks(slug, caseName) { await pause(); project(slug); return checks.filter((c) => !caseName || c.caseName === caseName); },

    async getUploads(slug) { await pause(); project(slug); return uploads.map((u) => u.info); },
    async upload(slug, { file, kind }) {
      await pause(400);
      need(slug, 'uploads:write');
      const u = me();
      const info = { id: uploads.length + 1, kind, name: file.name, size: file.size, contentType: file.type || 'application/octet-stream', createdBy: { id: u.id, name: u.name }, createdAt: new Date().toISOString() };
      uploads.push({ info, content: '', url: URL.createObjectURL(file) });
      return { upload: info, summary: {}, warnings: [] };
    },
    uploadUrl: (_slug, id) => uploads.find((u) => u.info.id === id)?.url ?? '#',

    async getTokens(slug) { await pause(); need(slug, 'tokens:manage'); return tokens.map((t) => ({ ...t })); },
    async createToken(slug, { name, scopes }) {
      await pause(250);
      need(slug, 'tokens:manage');
      const u = me();
      const prefix = hex(6);
      const t: CreatedToken = { id: tokens.length + 1, name, prefix, scopes: scopes ?? ['project:read'], owner: { id: u.id, name: u.name }, createdAt: new Date().toISOString(), lastUsedAt: null, revokedAt: null, token: `pp_${prefix}_${btoa(hex(32)).replace(/[=+/]/g, '').slice(0, 43)}` };
      const { token: _secret, ...kept } = t;
      tokens.unshift(kept);
      return t;
    },
    async revokeToken(_slug, id) { await pause(); const t = tokens.find((x) => x.id === id); if (t && !t.revokedAt) t.revokedAt = new Date().toISOString(); },

    async getUsers() { await pause(); if (me().role !== 'admin') throw new ApiError(403, 'forbidden', 'You do not have the right to do this. Ask an administrator.'); return users; },
    async updateUser(id, patch) { await pause(); const u = users.find((x) => x.id === id)!; Object.assign(u, patch); return u; },
    async getMail() { await pause(); if (me().role !== 'admin') throw new ApiError(403, 'forbidden', 'Only an administrator reads the captured mail.'); return mail.map(({ messageId: _m, toHeader: _t, html: _h, headers: _hd, ...m }) => m); },
    async getMailMessage(id) { await pause(); const m = mail.find((x) => x.id === id); if (!m) throw new ApiError(404, 'mail-not-found', 'No such message.'); return m; },
  };
  return api;
}
