/**
 * The few WebAssembly JavaScript API members coppice uses, typed locally (the project's `lib` has no DOM
 * types and @types/node 20 does not declare the WebAssembly namespace).
 */
export interface WasmMemory {
  readonly buffer: ArrayBuffer | SharedArrayBuffer;
  grow(pages: number): number;
}

/** An opaque compiled module (structured-cloneable to workers). */
export interface WasmModule {
  readonly __wasmModule?: never;
}

interface WasmApi {
  Memory: new (d: { initial: number; maximum?: number; shared?: boolean }) => WasmMemory;
  Module: new (bytes: Uint8Array) => WasmModule;
  Instance: new (m: WasmModule, imports: Record<string, Record<string, unknown>>) => { exports: Record<string, unknown> };
}

/** The global WebAssembly object. */
export const wasmApi: WasmApi = (globalThis as unknown as { WebAssembly: WasmApi }).WebAssembly;
