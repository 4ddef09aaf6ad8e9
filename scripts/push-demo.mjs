// First start only: sweep the demo studies and push them to the running server as the demo engineer,
// so the web app opens on real runs. Usage: node scripts/push-demo.mjs DATA_DIR PORT
import { existsSync, readFileSync, writeFileSync, rmSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';

const [data = '.data', port = '8080'] = process.argv.slice(2);
const marker = join(data, 'demo-runs-pushed');
const users = join(data, 'demo-users.txt');
if (existsSync(marker)) process.exit(0);
const server = `http://127.0.0.1:${port}`;
// Wait for the server (migrations and the first seed take a few seconds).
for (let i = 0; i < 300; i++) {
  try {
    if ((await fetch(`${server}/api/health`)).ok) break;
  } catch { /* not listening yet */ }
  await new Promise((r) => setTimeout(r, 200));
}
if (!existsSync(users)) process.exit(0);
const line = readFileSync(users, 'utf8').split('\n').find((l) => l.trim().startsWith('engineer'));
const [, email, password] = line.trim().split(/\s+/);
const res = await fetch(`${server}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
if (!res.ok) {
  console.error(`panelpoint: demo runs not pushed (sign-in answered ${res.status})`);
  process.exit(0);
}
const { token } = await res.json();
const env = { ...process.env, PANELPOINT_SERVER: server, PANELPOINT_TOKEN: token };
const runs = [
  ['examples/studies/depot-roof-demo.json', 'harrow-lane-depot'],
  ['examples/studies/depot-roof-sized.json', 'harrow-lane-depot'],
  ['examples/studies/kestrel-brook-warren.json', 'kestrel-brook-footbridge'],
];
for (const [study, project] of runs) {
  const out = join(data, 'demo-runs', project + '-' + study.split('/').pop().replace('.json', ''));
  rmSync(out, { recursive: true, force: true });
  const cli = (...args) => spawnSync(process.execPath, ['cli/bin/panelpoint.mjs', ...args], { env, stdio: ['ignore', 'ignore', 'inherit'] });
  console.error(`panelpoint: demo sweep ${study} → project ${project}`);
  if (cli('sweep', study, '--out', out, '-q').status !== 0 || cli('push', out, '--project', project).status !== 0) {
    console.error(`panelpoint: demo run ${study} not pushed`);
    process.exit(0);
  }
}
writeFileSync(marker, new Date().toISOString() + '\n');
console.error('panelpoint: demo runs pushed (Harrow Lane depot: 4,800 + 104 sized variants; Kestrel Brook footbridge: 480 sized variants)');
