export { Arena } from './arena.js';
export { createEngine, engine } from './engine.js';
export type { Engine, KernelChoice } from './engine.js';
export type { KernelSet } from './kernel-set.js';
export { BINS, MISSING, RESERVED, VALUE_STRIDE, classStride } from './layout.js';
export { tsKernels } from './ts-kernels.js';
export { wasmKernels, wasmModule, wasmPath } from './wasm-kernels.js';
export { predictLeavesTs, type TreePtrs } from './ts-predict.js';
