/**
 * Doc hygiene of the public API: every function reachable from `src/index.ts` (following `export *` and
 * `export { a as b } from` through each layer's index.ts to the declaring file) has a doc comment with a
 * summary and an `@example` (the rule in DEVELOPERS.md, "Doc comments"). Type-only exports are skipped.
 * Files are parsed one by one with the TypeScript parser; nothing is type-checked, so the walk is fast.
 */
import { readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const root = resolve(import.meta.dirname, '..', '..');

/** A function the public API exports: its public name, declaring file and whether its doc is complete. */
interface ExportedFunction {
  readonly name: string;
  readonly file: string;
  readonly summary: boolean;
  readonly example: boolean;
}

const parsed = new Map<string, ts.SourceFile>();

function sourceOf(file: string): ts.SourceFile {
  let sf = parsed.get(file);
  if (!sf) {
    sf = ts.createSourceFile(file, readFileSync(file, 'utf8'), ts.ScriptTarget.ES2022, true, ts.ScriptKind.TS);
    parsed.set(file, sf);
  }
  return sf;
}

/** `./x.js` from `from` → the .ts file it names. */
function targetOf(from: string, specifier: string): string {
  return resolve(dirname(from), specifier.replace(/\.js$/, '.ts'));
}

const isExported = (node: ts.Node): boolean =>
  ts.canHaveModifiers(node) && (ts.getModifiers(node) ?? []).some((m) => m.kind === ts.SyntaxKind.ExportKeyword);

function docOf(node: ts.Node): { summary: boolean; example: boolean } {
  const docs = ts.getJSDocCommentsAndTags(node).filter(ts.isJSDoc);
  const text = (j: ts.JSDoc): string => (typeof j.comment === 'string' ? j.comment : (j.comment ?? []).map((c) => c.text).join(''));
  return {
    summary: docs.some((j) => text(j).trim() !== ''),
    example: docs.some((j) => (j.tags ?? []).some((t) => t.tagName.text === 'example')),
  };
}

const isFunctionValue = (e: ts.Expression | undefined): boolean =>
  e !== undefined && (ts.isArrowFunction(e) || ts.isFunctionExpression(e));

/**
 * The declaration of `name` as seen from `file`: a function (with its doc), a non-function value (null),
 * or wherever an import or re-export sends it.
 */
function resolveName(file: string, name: string, seen = new Set<string>()): { file: string; doc: { summary: boolean; example: boolean } } | null {
  const key = `${file}#${name}`;
  if (seen.has(key)) return null;
  seen.add(key);
  const sf = sourceOf(file);
  const functions = sf.statements.filter((s): s is ts.FunctionDeclaration => ts.isFunctionDeclaration(s) && s.name?.text === name);
  if (functions.length) {
    const docs = functions.map(docOf);
    return { file, doc: { summary: docs.some((d) => d.summary), example: docs.some((d) => d.example) } };
  }
  for (const s of sf.statements) {
    if (ts.isVariableStatement(s)) {
      for (const d of s.declarationList.declarations) {
        if (!ts.isIdentifier(d.name) || d.name.text !== name) continue;
        if (isFunctionValue(d.initializer)) return { file, doc: docOf(s) };
        // `export const showValue = show;`: a function under a second name needs its own doc comment
        if (d.initializer && ts.isIdentifier(d.initializer) && resolveName(file, d.initializer.text, seen)) return { file, doc: docOf(s) };
        return null;
      }
    }
    if (ts.isExportDeclaration(s) && !s.isTypeOnly && s.moduleSpecifier && ts.isStringLiteral(s.moduleSpecifier) && s.exportClause && ts.isNamedExports(s.exportClause)) {
      for (const el of s.exportClause.elements) {
        if (el.name.text === name && !el.isTypeOnly) return resolveName(targetOf(file, s.moduleSpecifier.text), (el.propertyName ?? el.name).text, seen);
      }
    }
    if (ts.isImportDeclaration(s) && ts.isStringLiteral(s.moduleSpecifier) && s.importClause?.namedBindings && ts.isNamedImports(s.importClause.namedBindings)) {
      if (!s.moduleSpecifier.text.startsWith('.')) continue;
      for (const el of s.importClause.namedBindings.elements) {
        if (el.name.text === name) return resolveName(targetOf(file, s.moduleSpecifier.text), (el.propertyName ?? el.name).text, seen);
      }
    }
  }
  for (const s of sf.statements) {
    if (ts.isExportDeclaration(s) && !s.exportClause && s.moduleSpecifier && ts.isStringLiteral(s.moduleSpecifier)) {
      const found = resolveName(targetOf(file, s.moduleSpecifier.text), name, seen);
      if (found) return found;
    }
  }
  return null;
}

/** Every value name `file` exports (type-only exports left out). */
function exportedNames(file: string, seen = new Set<string>()): Set<string> {
  const out = new Set<string>();
  if (seen.has(file)) return out;
  seen.add(file);
  for (const s of sourceOf(file).statements) {
    if (ts.isExportDeclaration(s) && !s.isTypeOnly) {
      if (!s.exportClause && s.moduleSpecifier && ts.isStringLiteral(s.moduleSpecifier)) {
        for (const n of exportedNames(targetOf(file, s.moduleSpecifier.text), seen)) out.add(n);
      } else if (s.exportClause && ts.isNamedExports(s.exportClause)) {
        for (const el of s.exportClause.elements) if (!el.isTypeOnly) out.add(el.name.text);
      }
    } else if (ts.isFunctionDeclaration(s) && isExported(s) && s.name) {
      out.add(s.name.text);
    } else if (ts.isVariableStatement(s) && isExported(s)) {
      for (const d of s.declarationList.declarations) if (ts.isIdentifier(d.name)) out.add(d.name.text);
    }
  }
  return out;
}

function publicFunctions(): ExportedFunction[] {
  const entry = join(root, 'src', 'index.ts');
  const out: ExportedFunction[] = [];
  for (const name of exportedNames(entry)) {
    const found = resolveName(entry, name);
    if (found) out.push({ name, file: relative(root, found.file), ...found.doc });
  }
  return out.sort((a, b) => a.file.localeCompare(b.file) || a.name.localeCompare(b.name));
}

/**
 * Functions still missing a summary or an example, in files whose authors are still at work (the doc
 * hygiene task may not edit them). Each entry must still be an offender: remove it once its doc comment
 * is complete. Keep this list short.
 */
const ALLOWED_FOR_NOW: readonly string[] = [
  // src/learn/ensemble (ensemble-speed engineer, still at work)
  'defaultFeaturesPerSplit (src/learn/ensemble/forest.ts)',
  'defaultLossName (src/learn/ensemble/loss/pick.ts)',
  // src/notebook display and magics (notebook integrator, still at work)
  'isChartSpec (src/notebook/chart-bundle.ts)',
  'emitDisplay (src/notebook/display-sink.ts)',
  'hasRichSink (src/notebook/display-sink.ts)',
  'isModelValue (src/notebook/model-bundle.ts)',
  'kindOfValue (src/notebook/represent.ts)',
];

describe('public API exported from src/index.ts', () => {
  const functions = publicFunctions();
  const label = (f: ExportedFunction) => `${f.name} (${f.file})`;

  it('the export walk reaches every layer (so an empty walk cannot pass)', () => {
    const names = new Set(functions.map((f) => f.name));
    for (const n of ['createRng', 'readExtract', 'toDataset', 'fitTree', 'fitBoosting', 'splitHoldout', 'rmse', 'contributionsOf', 'chartTree', 'runNotebook', 'show', 'showValue']) {
      expect(names, n).toContain(n);
    }
    expect(functions.length).toBeGreaterThan(200);
  });

  it('every exported function has a doc comment with a summary and an @example', () => {
    const offenders = functions
      .filter((f) => !f.summary || !f.example)
      .map((f) => `${label(f)}${f.summary ? '' : ' no summary;'}${f.example ? '' : ' no @example'}`)
      .filter((o) => !ALLOWED_FOR_NOW.some((a) => o.startsWith(`${a} `) || o === a));
    expect(offenders).toEqual([]);
  });

  it('every allow-listed function still lacks its doc (remove entries once fixed)', () => {
    const incomplete = new Set(functions.filter((f) => !f.summary || !f.example).map(label));
    expect(ALLOWED_FOR_NOW.filter((a) => !incomplete.has(a))).toEqual([]);
  });
});
