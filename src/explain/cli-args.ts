/**
 * Command-line arguments of the explain commands: positionals, `--name value` / `--name=value` options,
 * and bare flags.
 */
import { errors } from '../errors.js';

export interface ParsedArgs {
  readonly positional: readonly string[];
  readonly options: ReadonlyMap<string, string>;
  readonly flags: ReadonlySet<string>;
}

/**
 * Parse `args` for `command`, knowing which options take a value and which are flags; anything else
 * starting with `--` is an error.
 * @example
 * parseArgs('score', ['m.json', 'x.csv', '--out', 'y.csv'], ['out'], ['strict']);
 */
export function parseArgs(command: string, args: readonly string[], valued: readonly string[], flags: readonly string[]): ParsedArgs {
  const positional: string[] = [];
  const options = new Map<string, string>();
  const seen = new Set<string>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (!a.startsWith('--') || a === '--') { positional.push(a); continue; }
    const eq = a.indexOf('=');
    const name = a.slice(2, eq < 0 ? undefined : eq);
    if (flags.includes(name)) {
      if (eq >= 0) throw errors.badArguments(command, `--${name} takes no value`);
      seen.add(name);
    } else if (valued.includes(name)) {
      const value = eq >= 0 ? a.slice(eq + 1) : args[++i];
      if (value === undefined || value === '') throw errors.badArguments(command, `--${name} needs a value`);
      if (options.has(name)) throw errors.badArguments(command, `--${name} is given twice`);
      options.set(name, value);
    } else {
      throw errors.badArguments(command, `unknown option --${name} (known: ${[...valued, ...flags].map((n) => `--${n}`).join(', ')})`);
    }
  }
  return { positional, options, flags: seen };
}
