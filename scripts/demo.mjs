#!/usr/bin/env node
/**
 * `npm run demo`: the whole job on invented data (notebooks-demo/).
 *
 * 1. builds the package if dist/ is missing or older than the sources;
 * 2. generates the spring (baseline) and summer (refreshed) extracts if absent (seeded);
 * 3. runs notebooks-demo/pallet-waste.ipynb headless on the spring extract (`coppice run`);
 * 4. reruns it unchanged on the summer extract, which compares itself with the spring run;
 * 5. prints the comparison and where both reports are.
 *
 * The summer rerun is expected to flag the planted drift and a failing decision check (its exit code is 1);
 * the demo itself exits 0 when that is what happened, non-zero otherwise.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const demo = join(root, 'notebooks-demo');
const cli = join(root, 'dist', 'cli.js');
const notebook = join(demo, 'pallet-waste.ipynb');
const out = join(demo, 'runs');

function newestMtime(dir) {
  let newest = 0;
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, e.name);
    newest = Math.max(newest, e.isDirectory() ? newestMtime(p) : statSync(p).mtimeMs);
  }
  return newest;
}

function step(text) {
  process.stdout.write(`\n== ${text}\n`);
}

if (!existsSync(cli) || statSync(cli).mtimeMs < newestMtime(join(root, 'src'))) {
  step('building the package (npm run build)');
  const b = spawnSync('npm', ['run', 'build'], { cwd: root, stdio: 'inherit' });
  if (!existsSync(cli)) process.exit(b.status || 1);
}

step('generating the extracts (seeded) if absent');
const { generateExtracts } = await import(join(demo, 'generate-extracts.mjs'));
const written = generateExtracts();
process.stdout.write(written.length ? `wrote ${written.map((p) => p.slice(root.length + 1)).join(', ')}\n` : 'already present\n');

// Each demo starts from a clean slate so the summer run compares with this spring run.
rmSync(out, { recursive: true, force: true });

function run(label, extraArgs) {
  step(label);
  const t0 = Date.now();
  const r = spawnSync(process.execPath, [cli, 'run', notebook, '--out', out, ...extraArgs], { cwd: root, encoding: 'utf8' });
  process.stdout.write(r.stdout);
  if (r.status === 2) process.stderr.write(r.stderr);
  process.stdout.write(`(exit code ${r.status}, ${((Date.now() - t0) / 1000).toFixed(1)} s)\n`);
  return r;
}

const spring = run('run 1: spring extract (baseline)', ['--no-baseline']);
if (spring.status !== 0) {
  process.stderr.write('demo: the baseline run did not complete with every check holding\n');
  process.exit(spring.status === 1 ? 3 : spring.status ?? 3);
}
const summer = run('run 2: the same notebook on the summer extract', ['--extract', `pallets=${join(demo, 'data', 'pallets-summer.csv')}`]);

const latest = JSON.parse(readFileSync(join(out, 'latest.json'), 'utf8')).run;
const runs = readdirSync(join(out, 'runs')).filter((n) => !n.startsWith('.')).sort();
step('reports');
for (const id of runs) process.stdout.write(`  ${join(out, 'runs', id, 'report.html').slice(root.length + 1)}${id === latest ? '  (latest)' : ''}\n`);

const flagged = /new categories "raspberry"/.test(summer.stdout) && /! truck_temp_c/.test(summer.stdout) && /\[FAILS\]/.test(summer.stdout);
if (summer.status === 1 && flagged) {
  process.stdout.write('\nThe rerun flagged the planted drift and a failing decision check, as intended.\n');
  process.exit(0);
}
process.stderr.write(`demo: expected the summer run to flag drift and fail a check (exit code 1), got ${summer.status}\n`);
process.exit(4);
