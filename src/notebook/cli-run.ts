/**
 * `coppice run <notebook> [--extract name=path-or-query]... [--out dir] [--baseline run | --no-baseline]`:
 * run a notebook headless, write the executed notebook, report and run record, and print how this run compares
 * with the previous one. Exit code: 0 every decision check holds, 1 a check fails, 2 the run failed or bad input.
 */
import { errors } from '../errors.js';
import { comparisonText, exitCodeReason } from './compare-text.js';
import { runNotebook, type RunOptions } from './runner.js';

const USAGE = 'usage: coppice run <notebook.ipynb> [--extract name=path-or-query]... [--out dir] [--baseline run | --no-baseline]';

interface RunArgs {
  notebook: string;
  options: { extracts: Record<string, string>; out?: string; baseline?: string | null };
}

function valueOf(args: readonly string[], i: number, flag: string): string {
  const v = args[i + 1];
  if (v === undefined || v.startsWith('--')) throw errors.badArguments('run', `${flag} needs a value; ${USAGE}`);
  return v;
}

/**
 * Parse the arguments of `coppice run`.
 * @example
 * parseRunArgs(['nb.ipynb', '--extract', 'parcels=new.csv']); // { notebook: 'nb.ipynb', options: { extracts: { parcels: 'new.csv' } } }
 */
export function parseRunArgs(args: readonly string[]): RunArgs {
  let notebook: string | null = null;
  const options: RunArgs['options'] = { extracts: {} };
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    let binding: string | null = null;
    if (a === '--extract') { binding = valueOf(args, i, a); i++; }
    else if (a.startsWith('--extract=')) binding = a.slice('--extract='.length);
    else if (a === '--out') { options.out = valueOf(args, i, a); i++; }
    else if (a.startsWith('--out=')) options.out = a.slice('--out='.length);
    else if (a === '--baseline') { options.baseline = valueOf(args, i, a); i++; }
    else if (a === '--no-baseline') options.baseline = null;
    else if (a.startsWith('-')) throw errors.badArguments('run', `unknown option ${JSON.stringify(a)}; ${USAGE}`);
    else if (notebook === null) notebook = a;
    else throw errors.badArguments('run', `one notebook at a time (got ${JSON.stringify(notebook)} and ${JSON.stringify(a)})`);
    if (binding !== null) {
      const eq = binding.indexOf('=');
      if (eq <= 0 || eq === binding.length - 1) throw errors.badExtractBinding(binding);
      const name = binding.slice(0, eq).trim();
      if (Object.prototype.hasOwnProperty.call(options.extracts, name)) throw errors.badArguments('run', `extract ${name} is bound twice`);
      options.extracts[name] = binding.slice(eq + 1);
    }
  }
  if (notebook === null) throw errors.badArguments('run', `no notebook given; ${USAGE}`);
  return { notebook, options };
}

export async function main(args: string[]): Promise<number> {
  const { notebook, options } = parseRunArgs(args);
  // A signal ends the run between steps: files are published in one synchronous step, so either a whole run
  // folder appears or none does.
  const stop = (signal: NodeJS.Signals) => {
    process.stderr.write(`coppice run: stopped by ${signal}; nothing was written for this run\n`);
    process.exit(signal === 'SIGINT' ? 130 : 143);
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
  const outcome = await runNotebook(notebook, options as RunOptions);
  const r = outcome.record;
  const out: string[] = [];
  out.push(`Run ${r.id}: ${r.status === 'ok' ? 'completed' : `FAILED at cell [${r.failure?.count}] — ${r.failure?.name}: ${r.failure?.message}`} in ${(r.ms / 1000).toFixed(1)} s`);
  out.push(`  notebook  ${outcome.notebookFile}`);
  out.push(`  report    ${outcome.runDir}/report.html`);
  out.push(`  record    ${outcome.runDir}/run.json`);
  for (const d of r.decisions) {
    const failing = d.checks.filter((c) => !c.holds);
    out.push(`  decision  ${d.title}: ${d.checks.length - failing.length} of ${d.checks.length} checks hold`);
  }
  process.stdout.write(`${out.join('\n')}\n\n`);
  if (outcome.comparison) process.stdout.write(comparisonText(outcome.comparison));
  else process.stdout.write(`No previous run to compare with.\nExit code ${outcome.exitCode}: ${exitCodeReason(outcome.exitCode)}.\n`);
  return outcome.exitCode;
}
