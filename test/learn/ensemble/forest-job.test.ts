import { describe, expect, it } from 'vitest';
import { fitBagging } from '../../../src/learn/ensemble/bagging.js';
import { fitForest } from '../../../src/learn/ensemble/forest.js';
import { forestJobSpec, growForestJob } from '../../../src/learn/ensemble/forest-job.js';
import { growForestMember } from '../../../src/learn/ensemble/forest-member.js';
import { OobTally } from '../../../src/learn/ensemble/oob.js';
import { resolveMemberTree } from '../../../src/learn/ensemble/options.js';
import type { TreeInfo } from '../../../src/learn/ensemble/progress.js';
import { builtModuleUrl, workerScriptUrl } from '../../../src/learn/parallel/package-root.js';
import { rowSourceOf } from '../../../src/learn/tree/row-source.js';
import { friedman1, penguins } from './fixtures.js';

// Worker threads load the built package (dist/, `npm run build`); without a build every tree grows in the
// calling thread and the worker-count checks below compare in-thread fits only.
const built = workerScriptUrl('tree-worker.js') !== null && builtModuleUrl(forestJobSpec({} as never).module) !== null;
const json = (v: unknown) => JSON.stringify(v);

describe('fitForest(data, { workers }) and fitBagging(data, { workers })', () => {
  it('the same seed gives a byte-identical model JSON with 1 and 2 workers', () => {
    if (!built) console.info('[forest-job] dist/ not built: workers run in-thread');
    const d = penguins();
    const one = fitForest(d, { size: 9, seed: 5, workers: 1 });
    expect(json(fitForest(d, { size: 9, seed: 5, workers: 2 }))).toBe(json(one));
    const f = friedman1(400, 3);
    const exact = fitBagging(f, { size: 5, seed: 2, engine: 'exact', leafRows: 3, workers: 1 });
    expect(json(fitBagging(f, { size: 5, seed: 2, engine: 'exact', leafRows: 3, workers: 2 }))).toBe(json(exact));
  }, 60_000);

  it('rejects a bad worker count', () => {
    expect(() => fitForest(friedman1(20, 1), { size: 2, workers: 0 })).toThrow(/workers/);
    expect(() => fitBagging(friedman1(20, 1), { size: 2, workers: 1.5 })).toThrow(/workers/);
  });
});

describe('fitForest(data, { onTree })', () => {
  it('reports each tree in order with the out-of-bag error of the curve; the model is unchanged (1 and 2 workers)', () => {
    const d = friedman1(300, 5);
    const plain = json(fitForest(d, { size: 12, seed: 2 }));
    for (const workers of [1, 2]) {
      const seen: TreeInfo[] = [];
      const m = fitForest(d, { size: 12, seed: 2, workers, onTree: (info) => seen.push(info) });
      expect(json(m)).toBe(plain);
      expect(seen.map((s) => s.done)).toEqual(Array.from({ length: 12 }, (_, i) => i + 1));
      expect(seen.every((s) => s.total === 12)).toBe(true);
      expect(seen.map((s) => s.oobError)).toEqual(m.oobCurve.map((p) => p.error));
    }
  }, 60_000);

  it('an error thrown by the callback stops the fit; a non-function is rejected', () => {
    expect(() => fitBagging(friedman1(50, 1), { size: 5, onTree: (i) => { if (i.done === 2) throw new Error('enough'); } })).toThrow('enough');
    expect(() => fitBagging(friedman1(50, 1), { size: 5, onTree: 'yes' as never })).toThrow(/onTree/);
  });
});

describe('growForestJob(input, t)', () => {
  it('grows member first + t and routes exactly its out-of-bag rows; OobTally.addLeaves equals addTree', () => {
    const d = friedman1(150, 8);
    const values = d.target.kind === 'number' ? d.target.values : new Float64Array(0);
    const data = { frame: d.features, response: { kind: 'value' as const, values, leaf: 'mean' as const }, weights: new Float64Array(150).fill(1) };
    const plan = { tree: resolveMemberTree({}, { criterion: 'gini', depthLimit: Infinity, leafRows: 5 }), featuresPerSplit: 3 };
    const job = growForestJob({ data, plan, seed: 4, first: 2 }, 1);
    const member = growForestMember(data, plan, 4, 3);
    expect(json(job.tree)).toBe(json(member.tree));
    const src = rowSourceOf(d.features);
    const a = new OobTally(150, 0, values, data.weights, false), b = new OobTally(150, 0, values, data.weights, false);
    for (let i = 0; i < 150; i++) expect(job.oobLeaf[i] < 0).toBe(member.counts[i] > 0);
    expect(b.addLeaves(job.tree, job.oobLeaf)).toBe(a.addTree(member.tree, src, member.counts));
    expect(Array.from(b.sums)).toEqual(Array.from(a.sums));
  });
});
