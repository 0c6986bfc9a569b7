import { describe, expect, it } from 'vitest';
import { defaultGrowSettings } from '../../../src/learn/grow-task.js';
import { growMemberJob, memberJobSpec, type MemberJobInput } from '../../../src/learn/parallel/member-job.js';
import { workerScriptUrl, builtModuleUrl } from '../../../src/learn/parallel/package-root.js';
import { runTreeJobs } from '../../../src/learn/parallel/tree-jobs.js';
import { toShared } from '../../../src/learn/parallel/share.js';
import { penguins } from '../hist/datasets.js';

// Worker threads load dist/ (npm run build, part of prepare); without a build the jobs run in-thread and
// these tests still check the in-thread results.
const built = workerScriptUrl('tree-worker.js') !== null;

function input(engine: 'exact' | 'histogram'): MemberJobInput {
  const d = penguins();
  return {
    data: { frame: d.frame, weights: d.weights, response: { kind: 'class', codes: d.codes, nClasses: d.nClasses, criterion: 'gini' } },
    plan: { tree: { criterion: 'gini', engine, grow: { ...defaultGrowSettings, categorical: 'subset', leafRows: 2 } }, featuresPerSplit: 2 },
    seed: 11,
  };
}

describe('runTreeJobs(count, spec, workers)', () => {
  it('the same seed gives byte-identical members with 1, 2 and 3 workers', () => {
    for (const engine of ['histogram', 'exact'] as const) {
      const spec = memberJobSpec(input(engine));
      const text = (w: number) => JSON.stringify(runTreeJobs(12, spec, w), (_k, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v));
      const one = text(1);
      expect(text(2)).toBe(one);
      expect(text(3)).toBe(one);
    }
  });

  it('returns job(input, t) in index order', () => {
    const inp = input('histogram');
    const got = runTreeJobs(4, memberJobSpec(inp), 2);
    got.forEach((m, t) => expect(m).toEqual(growMemberJob(inp, t)));
  });

  it('finds the built worker script and job module (when dist/ is built)', () => {
    if (!built) return;
    expect(builtModuleUrl(memberJobSpec(input('exact')).module)?.href).toMatch(/dist\/learn\/parallel\/member-job\.js$/);
  });

  it('a job failing in the calling thread throws its own error', () => {
    const spec = { ...memberJobSpec(input('histogram')), run: (_i: MemberJobInput, t: number) => { if (t === 2) throw new Error('boom'); return t; } };
    expect(() => runTreeJobs(3, spec, 1)).toThrow(/boom/);
  });

  it('rejects bad counts and worker numbers', () => {
    const spec = memberJobSpec(input('exact'));
    expect(() => runTreeJobs(-1, spec, 1)).toThrow(/count/);
    expect(() => runTreeJobs(2, spec, 0)).toThrow(/workers/);
    expect(runTreeJobs(0, spec, 2)).toEqual([]);
  });
});

describe('toShared(value)', () => {
  it('moves typed arrays into shared memory, keeping values', () => {
    const v = toShared({ a: Float64Array.of(1, 2), b: [Int32Array.of(3)], c: 'x', d: Infinity });
    expect(v.a.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(Array.from(v.a)).toEqual([1, 2]);
    expect(v.b[0].buffer).toBeInstanceOf(SharedArrayBuffer);
    expect([v.c, v.d]).toEqual(['x', Infinity]);
  });
});
