/**
 * The WebAssembly kernel set: build/kernels.wasm (compiled from assembly/ by `npm run build:wasm`),
 * found relative to this module so it works from src/ (tests) and from dist/ (the package). Returns null
 * when the file is absent or cannot be instantiated; callers then use the TypeScript twins.
 */
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Arena } from './arena.js';
import { wasmApi, type WasmModule } from './wasm-api.js';
import type { KernelSet } from './kernel-set.js';

type Fn = (...args: number[]) => number;

let compiled: WasmModule | null | undefined;

/** Path of the compiled kernels (src/kernels/ and dist/kernels/ both sit two levels below the package root). */
export function wasmPath(): string {
  return fileURLToPath(new URL('../../build/kernels.wasm', import.meta.url));
}

/** The compiled module, or null when build/kernels.wasm is absent or invalid (cached). */
export function wasmModule(): WasmModule | null {
  if (compiled !== undefined) return compiled;
  const path = wasmPath();
  try {
    compiled = existsSync(path) ? new wasmApi.Module(readFileSync(path)) : null;
  } catch {
    compiled = null;
  }
  return compiled;
}

/**
 * Instantiate the kernels over `arena`'s memory, or null when the wasm build is missing or the memory is
 * not shared (the module imports a shared memory).
 * @example
 * const k = wasmKernels(new Arena()) ?? tsKernels(arena);
 */
export function wasmKernels(arena: Arena, module: WasmModule | null = wasmModule()): KernelSet | null {
  if (!module || !arena.shared) return null;
  let ex: Record<string, Fn>;
  try {
    ex = new wasmApi.Instance(module, { env: { memory: arena.memory } }).exports as unknown as Record<string, Fn>;
  } catch {
    return null;
  }
  return {
    name: 'wasm',
    gatherValue: ex.gatherValue,
    gatherClass: ex.gatherClass,
    histValue: ex.histValue,
    histClass: ex.histClass,
    histSubtract: ex.histSubtract,
    partitionRows: ex.partitionRows,
    scanValue: ex.scanValue,
    histValueSparse: ex.histValueSparse,
    scanValueList: ex.scanValueList,
    predictLeaves: (t, dataPtr, nRows, outPtr) => {
      ex.predictLeaves(t.kind, t.feature, t.threshold, t.left, t.right, t.missing, t.offset, t.width, t.branches, t.catBits, dataPtr, nRows, outPtr);
    },
  };
}
