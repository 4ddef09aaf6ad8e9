/** Reference cases, their CI check history, uploads and captured mail of the fake demo. */
import type { CapturedMailDetail, CheckRecord, ReferenceCaseDetail, UploadInfo } from '@/lib/api-types';

const files = import.meta.glob<Record<string, unknown>>('/examples/reference/*.json', { eager: true, import: 'default' });
const CASE_FILES = ['depot-roof-r3', 'pratt-six-panel', 'pratt-six-panel-pin-pin', 'three-bar-frame', 'critical-form-two-panel', 'cantilever-wall-bracket'];

const day = (n: number, h = 9) => new Date(Date.UTC(2025, 1, 3 + n, h, 12)).toISOString();
const ELLIS = { id: 2, name: 'Ellis Engineer' };

export function demoCases(): ReferenceCaseDetail[] {
  return CASE_FILES.map((name, i) => {
    const body = files[`/examples/reference/${name}.json`] ?? { name };
    return {
      id: i + 1, name, description: (body.description as string) ?? null, source: body.source ?? null,
      frozenBy: ELLIS, createdAt: day(i), latest: null, body,
    };
  });
}

const COMMITS = ['3f9a1c2e', '7be04d91', 'a12c5f80', 'c4d8e7b3', '0e6f2a9d', '91b3c7e4', 'd2a85f16', '5c7e0b42'];

/** Eight commits of CI: the depot case drifts for two of them, one case file fails to load once. */
export function demoChecks(cases: ReferenceCaseDetail[]): CheckRecord[] {
  const out: CheckRecord[] = [];
  let id = 1;
  COMMITS.forEach((commit, k) => {
    for (const c of cases) {
      const drift = c.name === 'depot-roof-r3' && (k === 4 || k === 5);
      const invalid = c.name === 'cantilever-wall-bracket' && k === 2;
      out.push({
        id: id++, caseId: c.id, caseName: c.name, status: invalid ? 'invalid' : drift ? 'drift' : 'pass', file: `examples/reference/${c.name}.json`,
        gitCommit: `${commit}${'0'.repeat(32)}`,
        details: drift ? [{ figure: 'results["ULS-1"].memberForces.TC3', want: -132.3, got: -132.9, difference: 0.6, allowed: 0.13 }]
          : invalid ? [{ path: 'model.file', message: 'file not found: cantilever-wall-bracket.model.json' }] : null,
        pushedBy: { id: 6, name: 'CI (token ci-main)' }, createdAt: day(10 + k, 6),
      });
    }
  });
  return out.reverse();
}

export function demoUploads(): { info: UploadInfo; content: string }[] {
  const study = JSON.stringify({ name: 'Depot roof, Howe alternative', family: 'howe', fixed: { span: 24 }, vary: { panels: [8, 10], depth: { from: 1.5, to: 3, step: 0.5 } } }, null, 2);
  const dxf = '0\nSECTION\n2\nENTITIES\n0\nLINE\n8\nTRUSS\n10\n0\n20\n0\n11\n3000\n21\n0\n0\nENDSEC\n0\nEOF\n';
  return [
    { info: { id: 1, kind: 'study', name: 'depot-roof-howe.json', size: study.length, contentType: 'application/json', createdBy: ELLIS, createdAt: day(6, 14) }, content: study },
    { info: { id: 2, kind: 'dxf', name: 'gridline-C-elevation.dxf', size: dxf.length, contentType: 'application/dxf', createdBy: { id: 3, name: 'Rowan Reviewer' }, createdAt: day(8, 11) }, content: dxf },
  ];
}

export function demoMail(): CapturedMailDetail[] {
  const base = (id: number, to: string, subject: string, text: string, d: string): CapturedMailDetail => ({
    id, from: 'Panelpoint <no-reply@panelpoint.example>', to: [to], subject, text, receivedAt: d, messageId: `<demo-${id}@panelpoint.example>`,
    toHeader: to, html: null, headers: [{ name: 'From', value: 'Panelpoint <no-reply@panelpoint.example>' }, { name: 'To', value: to }, { name: 'Subject', value: subject }],
  });
  return [
    base(4, 'engineer@panelpoint.example', 'Reference case depot-roof-r3 started drifting', 'The check of depot-roof-r3 at commit 0e6f2a9d drifted:\n  results["ULS-1"].memberForces.TC3 want -132.3 kN, got -132.9 kN (allowed 0.13 kN).\n\nSee the reference cases page of Harrow Lane depot roof.', day(14, 6)),
    base(3, 'new.colleague@panelpoint.example', 'You are invited to Harrow Lane depot roof', 'Ellis Engineer invites you to the project Harrow Lane depot roof as reviewer.\n\nAccept within 7 days:\nhttp://127.0.0.1:5173/invitations/accept?token=demo-invitation-token-not-real\n', day(9, 15)),
    base(2, 'viewer@panelpoint.example', 'Reset your Panelpoint password', 'Someone asked to reset the password of this account.\n\nSet a new one within 30 minutes:\nhttp://127.0.0.1:5173/reset-password?token=demo-reset-token-not-real\n\nIf it was not you, ignore this mail.', day(5, 10)),
    base(1, 'reviewer@panelpoint.example', 'Your Panelpoint account', 'Ada Admin made you an account on the team server. Sign in with this address.', day(1, 9)),
  ];
}
