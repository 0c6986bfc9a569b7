#!/usr/bin/env node
/**
 * The `coppice` command. Each subcommand lives in its own module, loaded only when called.
 */
import { CoppiceError } from './errors.js';

interface Command {
  summary: string;
  load: () => Promise<{ main: (args: string[]) => Promise<number> }>;
}

const commands: Record<string, Command> = {
  kernel: { summary: 'run the Jupyter kernel: coppice kernel --connection <file>', load: () => import('./notebook/cli-kernel.js') },
  'install-kernel': { summary: 'write the kernelspec: coppice install-kernel [--user | --prefix DIR]', load: () => import('./notebook/cli-install.js') },
  run: { summary: 'run a notebook headless: coppice run <notebook> [--extract name=source]... [--out dir]', load: () => import('./notebook/cli-run.js') },
  compare: { summary: 'compare two run records: coppice compare <a> <b>', load: () => import('./notebook/cli-compare.js') },
  score: { summary: 'score an extract: coppice score <model.json> <extract> --out <file>', load: () => import('./explain/cli-score.js') },
  'export-onnx': { summary: 'export to ONNX-ML: coppice export-onnx <model.json> <out.onnx>', load: () => import('./explain/cli-onnx.js') },
};

function usage(): string {
  const lines = Object.entries(commands).map(([name, c]) => `  ${name.padEnd(15)} ${c.summary}`);
  return `usage: coppice <command> [options]\n\ncommands:\n${lines.join('\n')}\n`;
}

export async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    process.stdout.write(usage());
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    process.stderr.write(`coppice: unknown command ${JSON.stringify(name)}\n\n${usage()}`);
    return 2;
  }
  try {
    const mod = await command.load();
    return await mod.main(rest);
  } catch (err) {
    if (err instanceof CoppiceError) {
      process.stderr.write(`coppice ${name}: ${err.message}\n`);
      return 2;
    }
    throw err;
  }
}

const invokedDirectly = process.argv[1] && import.meta.url === new URL(`file://${process.argv[1]}`).href;
if (invokedDirectly || process.argv[1]?.endsWith('/coppice')) {
  main(process.argv.slice(2)).then((code) => { process.exitCode = code; });
}
