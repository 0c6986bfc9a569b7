import { describe, expect, it } from 'vitest';
import { compileCell } from '../../src/notebook/magic-compile.js';
import { builtinMagics } from '../../src/notebook/magics.js';
import { CoppiceError } from '../../src/errors.js';

const compile = (src: string) => compileCell(src, builtinMagics);
const head = 'import * as coppice$ from "coppice"; ';

function message(src: string): string {
  try {
    compile(src);
  } catch (err) {
    if (err instanceof CoppiceError) return err.message;
    throw err;
  }
  throw new Error('expected a magic error');
}

describe('compileCell(source, builtinMagics)', () => {
  it('returns a cell without magics unchanged', () => {
    expect(compile('const x = 1 % 2;')).toEqual({ code: 'const x = 1 % 2;', used: [] });
  });

  it('compiles %extract to a declareExtract call and keeps line numbers', () => {
    const c = compile('// inputs\n%extract claims data/claims.csv\nclaims.numRows()');
    expect(c.code.split('\n')).toEqual([
      `${head}// inputs`,
      'const claims: coppice$.ExtractTable = await coppice$.declareExtract("claims", "data/claims.csv");',
      'claims.numRows()',
    ]);
    expect(c.used).toEqual(['extract']);
  });

  it('reads a quoted %extract source and a multi-line %%extract query', () => {
    expect(compile('%extract q "sql:SELECT 1 AS \\"a b\\""').code).toContain('declareExtract("q", "sql:SELECT 1 AS \\"a b\\"")');
    const c = compile('%%extract recent\nsql:SELECT *\n  FROM claims');
    expect(c.code.split('\n')).toHaveLength(3);
    expect(c.code).toContain('declareExtract("recent", "sql:SELECT *\\n  FROM claims")');
  });

  it('points at a bad extract name with a caret', () => {
    expect(message('%extract 2024claims x.csv')).toBe(
      'Magic at line 1, column 10: extract name "2024claims" is not a valid variable name.\n  %extract 2024claims x.csv\n           ^^^^^^^^^^');
    expect(message('%extract claims')).toContain('missing the source');
  });

  it('points at an unknown magic name', () => {
    expect(message('%fitt m tree')).toBe(
      'Magic at line 1, column 2: unknown magic %fitt; known: extract, glance, fit, lineup, decide.\n  %fitt m tree\n   ^^^^');
  });

  it('says which form to use when a cell magic is written as a line magic', () => {
    expect(message('%fit m tree')).toContain('use %%fit');
  });

  it('compiles %%fit line for line through the learner table', () => {
    const src = '%%fit firstTree tree\ndata: train\ntarget: species\n# a comment\ndepth: 3\nexclude: id, island';
    const lines = compile(src).code.split('\n');
    expect(lines).toHaveLength(6);
    expect(lines[0]).toBe(`${head}const firstTree = await coppice$.watchFit("firstTree", "tree", (d, o) => coppice$.fitTree(d, o), {`);
    expect(lines.slice(1)).toEqual(['  data: (train),', '  target: "species",', '', '  depthLimit: 3,', '  exclude: ["id", "island"],});']);
  });

  it('maps forest settings to the forest options', () => {
    const code = compile('%%fit f forest\ndata: t\ntarget: y\ntrees: 200\nseed: 7\nleaf-rows: 5').code;
    expect(code).toContain('coppice$.fitForest(d, o)');
    expect(code).toContain('  size: 200,');
    expect(code).toContain('  seed: 7,');
    expect(code).toContain('  leafRows: 5,');
  });

  it('points at an unknown learner, an unknown setting and a bad number', () => {
    expect(message('%%fit m shrub\ndata: t\ntarget: y')).toBe(
      'Magic at line 1, column 9: unknown learner "shrub"; one of tree, forest, bagging, adaboost, boosting, stacking.\n  %%fit m shrub\n          ^^^^^');
    const unknown = message('%%fit m tree\ndata: t\ntarget: y\ndpeth: 3');
    expect(unknown).toMatch(/^Magic at line 4, column 1: unknown setting "dpeth" for tree; known: /);
    expect(unknown.endsWith('\n  dpeth: 3\n  ^^^^^')).toBe(true);
    expect(message('%%fit m tree\ndata: t\ntarget: y\ndepth: three')).toBe(
      'Magic at line 4, column 8: depth: expected a whole number, found "three".\n  depth: three\n         ^^^^^');
  });

  it('requires data and target in %%fit', () => {
    expect(message('%%fit m tree\ntarget: y')).toContain('%%fit needs a "data:" line');
  });

  it('points at a body line that is not a setting', () => {
    expect(message('%%fit m tree\ndata = t')).toBe(
      'Magic at line 2, column 1: expected "name: value" in %%fit, found "data".\n  data = t\n  ^^^^');
  });

  it('rejects a setting given twice', () => {
    expect(message('%%fit m tree\ndata: a\ndata: b\ntarget: y')).toContain('line 3, column 1: setting data is given twice (first at line 2)');
  });

  it('compiles %%lineup to showLineup with the models as an object', () => {
    const lines = compile('%%lineup holdout\nmodels: a, b\ndata: test\nmetrics: accuracy').code.split('\n');
    expect(lines).toEqual([`${head}void (await coppice$.showLineup(`, '  { a: a, b: b },', '  (test),', '{ title: "holdout", metrics: ["accuracy"] }));']);
  });

  it('points at a bad model name in %%lineup', () => {
    expect(message('%%lineup\nmodels: a, 3b\ndata: t')).toBe(
      'Magic at line 2, column 12: model "3b" is not a variable name.\n  models: a, 3b\n             ^^');
  });

  it('compiles %%decide to recordDecision, merging repeated checks', () => {
    const src = '%%decide Use the forest\nwhy: Best accuracy.\n  Stable across folds.\nevidence: holdout\ncheck: holdout: f accuracy >= 0.9\ncheck: bill_length_mm in top 3 of importance\naffects: none';
    const lines = compile(src).code.split('\n');
    expect(lines).toHaveLength(7);
    expect(lines[0]).toBe(`${head}void coppice$.recordDecision({ title: "Use the forest",`);
    expect(lines[1]).toBe('  reasoning: "Best accuracy.\\nStable across folds.",');
    expect(lines[3]).toBe('  evidence: ["holdout"],');
    expect(lines[4]).toBe('  checks: ["holdout: f accuracy >= 0.9", "bill_length_mm in top 3 of importance"],');
    expect(lines[5]).toBe('');
    expect(lines[6]).toBe('  affects: [],});');
  });

  it('points at a malformed decision check before anything runs', () => {
    const m = message('%%decide Keep it\ncheck: accuracy is high');
    expect(m).toMatch(/^Magic at line 2, column 8: Decision check "accuracy is high" is invalid: expected/);
    expect(m.endsWith('\n  check: accuracy is high\n         ^^^^^^^^^^^^^^^^')).toBe(true);
  });

  it('compiles %glance to showValue with the glance form', () => {
    expect(compile('%glance penguins').code).toBe(`${head}await coppice$.showValue((penguins), { as: "glance" });`);
    expect(message('%glance')).toContain('missing the table');
  });
});
