/**
 * Turn a cell with magics into ordinary TypeScript, before any of it runs.
 *
 * Each magic compiles to exactly as many lines as it occupies in the cell, so compiler messages about
 * the rest of the cell keep their line numbers, and a value written in a settings line (an expression
 * such as `data: train`) sits on the same line in the generated code. Generated code reaches coppice
 * through one namespace import, `RUNTIME`, added to the first line.
 */
import type { MagicCall } from './magic-parse.js';
import { magicError, splitCell } from './magic-parse.js';

/** The namespace name generated code uses for coppice's exports. */
export const RUNTIME = 'coppice$';

/** One magic: how it is called and what TypeScript it becomes. */
export interface MagicDefinition {
  readonly name: string;
  /** One line for help text: the call shape. */
  readonly usage: string;
  /** `%name` only, `%%name` only, or both. */
  readonly form: 'line' | 'cell' | 'both';
  /**
   * TypeScript lines for `call`: one per line the call occupies (its own line, plus the body for a
   * cell magic). Throws a magic error (with a caret) for malformed input.
   */
  compile(call: MagicCall): string[];
}

export interface CompiledCell {
  /** The TypeScript to run. Equal to the input when the cell has no magics. */
  readonly code: string;
  /** Names of the magics used, in order. */
  readonly used: readonly string[];
}

/**
 * Compile the magics in `source` with the definitions in `magics`.
 * @example
 * compileCell('%extract claims data/claims.csv', builtinMagics).code;
 * // 'import * as coppice$ from "coppice"; const claims = await coppice$.declareExtract("claims", "data/claims.csv");'
 */
export function compileCell(source: string, magics: readonly MagicDefinition[]): CompiledCell {
  const parts = splitCell(source);
  if (!parts.some((p) => p.kind === 'magic')) return { code: source, used: [] };
  const out: string[] = [];
  const used: string[] = [];
  for (const part of parts) {
    if (part.kind === 'code') {
      out.push(part.text);
      continue;
    }
    const call = part.call;
    const def = magics.find((m) => m.name === call.name);
    const line = call.text;
    const sign = call.cell ? '%%' : '%';
    if (!def) {
      const known = magics.map((m) => m.name).join(', ');
      magicError(call.nameAt, line, call.name.length, `unknown magic ${sign}${call.name}; known: ${known}`);
    }
    if ((def.form === 'line' && call.cell) || (def.form === 'cell' && !call.cell)) {
      const want = def.form === 'cell' ? '%%' : '%';
      magicError(call.nameAt, line, call.name.length, `use ${want}${def.name} (usage: ${def.usage})`);
    }
    const lines = def.compile(call);
    const span = 1 + call.body.length;
    if (lines.length !== span) throw new Error(`magic ${def.name} produced ${lines.length} lines for ${span}`);
    out.push(...lines);
    used.push(def.name);
  }
  out[0] = `import * as ${RUNTIME} from "coppice"; ${out[0]}`;
  return { code: out.join('\n'), used };
}

/** A TypeScript string literal for `text`. */
export function quote(text: string): string {
  return JSON.stringify(text);
}

/** True when `name` can be declared as a TypeScript constant. */
export function isIdentifier(name: string): boolean {
  return /^[A-Za-z_$][\w$]*$/.test(name) && !reserved.has(name);
}

const reserved = new Set(
  ('break case catch class const continue debugger default delete do else enum export extends false finally for ' +
    'function if import in instanceof new null return super switch this throw true try typeof var void while with ' +
    'let static yield await implements interface package private protected public').split(' '),
);
