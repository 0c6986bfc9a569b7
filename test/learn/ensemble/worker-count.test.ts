import { availableParallelism } from 'node:os';
import { describe, expect, it } from 'vitest';
import { parallelThreshold, treeWorkers } from '../../../src/learn/ensemble/worker-count.js';

describe('treeWorkers(given, n, size)', () => {
  it('defaults to 1 below the threshold of rows × trees, else min(2, cores)', () => {
    expect(treeWorkers(undefined, 1000, 50)).toBe(1);
    expect(treeWorkers(undefined, parallelThreshold / 100 - 1, 100)).toBe(1);
    expect(treeWorkers(undefined, 100_000, 500)).toBe(Math.min(2, availableParallelism()));
  });
  it('keeps a given count and rejects a bad one', () => {
    expect(treeWorkers(3, 10, 2)).toBe(3);
    expect(() => treeWorkers(0, 10, 2)).toThrow(/workers/);
    expect(() => treeWorkers('2', 10, 2)).toThrow(/workers/);
  });
});
