/** The TypeScript kernel set over an arena's memory (reference and fallback). */
import type { Arena } from './arena.js';
import type { KernelSet } from './kernel-set.js';
import { gatherClassTs, gatherValueTs } from './ts-gather.js';
import { histClassTs, histSubtractTs, histValueTs } from './ts-hist.js';
import { partitionRowsTs } from './ts-partition.js';
import { predictLeavesTs } from './ts-predict.js';
import { scanValueListTs, scanValueTs } from './ts-scan.js';
import { histValueSparseTs } from './ts-sparse.js';

/**
 * Kernels written in TypeScript, reading and writing `arena`'s memory.
 * @example
 * const k = tsKernels(new Arena());
 */
export function tsKernels(arena: Arena): KernelSet {
  const m = arena.memory;
  return {
    name: 'ts',
    gatherValue: (...a) => gatherValueTs(m.buffer, ...a),
    gatherClass: (...a) => gatherClassTs(m.buffer, ...a),
    histValue: (...a) => histValueTs(m.buffer, ...a),
    histClass: (...a) => histClassTs(m.buffer, ...a),
    histSubtract: (...a) => histSubtractTs(m.buffer, ...a),
    partitionRows: (...a) => partitionRowsTs(m.buffer, ...a),
    scanValue: (...a) => scanValueTs(m.buffer, ...a),
    histValueSparse: (...a) => histValueSparseTs(m.buffer, ...a),
    scanValueList: (...a) => scanValueListTs(m.buffer, ...a),
    predictLeaves: (...a) => predictLeavesTs(m.buffer, ...a),
  };
}
