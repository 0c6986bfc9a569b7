/**
 * The per-thread kernel engine: one arena and the best kernel set available for it (wasm, else the
 * TypeScript twins). `COPPICE_KERNELS=ts` in the environment forces the twins (for comparisons).
 */
import { Arena } from './arena.js';
import type { KernelSet } from './kernel-set.js';
import { tsKernels } from './ts-kernels.js';
import { wasmKernels } from './wasm-kernels.js';

export interface Engine {
  readonly arena: Arena;
  readonly kernels: KernelSet;
}

let current: Engine | null = null;

/** Which kernels to use: 'auto' (wasm when built), 'wasm' (null if unavailable) or 'ts'. */
export type KernelChoice = 'auto' | 'wasm' | 'ts';

/**
 * An engine over `arena` (a new one by default) with the chosen kernels.
 * @example
 * const { arena, kernels } = createEngine();
 */
export function createEngine(choice: KernelChoice = 'auto', arena: Arena = new Arena()): Engine {
  const forced = process.env.COPPICE_KERNELS === 'ts' ? 'ts' : choice;
  const wasm = forced === 'ts' ? null : wasmKernels(arena);
  return { arena, kernels: wasm ?? tsKernels(arena) };
}

/** This thread's shared engine (created on first use). */
export function engine(): Engine {
  if (!current) current = createEngine();
  return current;
}
