import { describe, expect, it } from 'vitest';
import { binFrame } from '../../../src/table/bin-frame.js';
import { binnedFrameFor } from '../../../src/table/bin-cache.js';
import { binFrameParallel } from '../../../src/learn/parallel/bin-job.js';
import { createRng } from '../../../src/util/rng.js';
import { penguins } from '../hist/datasets.js';
import { makeFrame } from '../hist/make-frame.js';

describe('binFrameParallel(frame, threads)', () => {
  it('equals binFrame(frame) and is remembered as the frame\'s bins', () => {
    const rng = createRng(4);
    const frames = [penguins().frame, makeFrame({ a: Array.from({ length: 3000 }, () => rng.normal()), b: Array.from({ length: 3000 }, () => rng.int(7)) })];
    for (const f of frames) {
      const par = binFrameParallel(f, 2);
      const one = binFrame(f);
      expect(par.features).toEqual(one.features);
      expect(Array.from(par.codes)).toEqual(Array.from(one.codes));
      expect(binnedFrameFor(f)).toBe(par);
      expect(binFrameParallel(f, 2)).toBe(par);
    }
  });
});
