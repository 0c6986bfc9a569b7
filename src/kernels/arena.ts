/**
 * The memory every kernel works in: one `WasmMemory` (shared when the platform allows, so worker
 * threads can map the same bytes) with a small first-fit allocator kept on the JavaScript side.
 * Layout of what goes in it: see layout.ts.
 */
import { errors } from '../errors.js';
import { wasmApi, type WasmMemory } from './wasm-api.js';
import { MAX_PAGES, PAGE, RESERVED } from './layout.js';

const ALIGN = 64;

function newMemory(): { memory: WasmMemory; shared: boolean } {
  try {
    return { memory: new wasmApi.Memory({ initial: 2, maximum: MAX_PAGES, shared: true }), shared: true };
  } catch {
    return { memory: new wasmApi.Memory({ initial: 2, maximum: MAX_PAGES }), shared: false };
  }
}

/**
 * @example
 * const a = new Arena();
 * const p = a.put(Float64Array.of(1, 2));
 * a.f64(p, 2); // Float64Array [1, 2], a view into the shared memory
 * a.release(p);
 */
export class Arena {
  readonly memory: WasmMemory;
  readonly shared: boolean;
  private top = RESERVED;
  /** Free blocks, sorted by offset: [offset, size]. */
  private free: [number, number][] = [];
  private sizes = new Map<number, number>();

  /** A fresh arena, or one over an existing memory (a worker mapping the main thread's memory). */
  constructor(memory?: WasmMemory) {
    if (memory) {
      this.memory = memory;
      this.shared = memory.buffer instanceof SharedArrayBuffer;
    } else {
      const m = newMemory();
      this.memory = m.memory;
      this.shared = m.shared;
    }
  }

  get buffer(): ArrayBuffer | SharedArrayBuffer {
    return this.memory.buffer;
  }

  /** Bytes currently handed out or freed below the top (the arena's footprint). */
  get used(): number {
    return this.top;
  }

  /** Allocate `bytes` (rounded up to 64) and return the offset. The bytes are not cleared. */
  alloc(bytes: number): number {
    const size = Math.max(ALIGN, Math.ceil(bytes / ALIGN) * ALIGN);
    for (let i = 0; i < this.free.length; i++) {
      const [off, sz] = this.free[i];
      if (sz < size) continue;
      if (sz === size) this.free.splice(i, 1);
      else this.free[i] = [off + size, sz - size];
      this.sizes.set(off, size);
      return off;
    }
    const off = this.top;
    this.ensure(off + size);
    this.top = off + size;
    this.sizes.set(off, size);
    return off;
  }

  /** Return a block to the arena (coalescing with free neighbours). */
  release(off: number): void {
    const size = this.sizes.get(off);
    if (size === undefined) return;
    this.sizes.delete(off);
    let i = 0;
    while (i < this.free.length && this.free[i][0] < off) i++;
    this.free.splice(i, 0, [off, size]);
    if (i + 1 < this.free.length && off + size === this.free[i + 1][0]) {
      this.free[i][1] += this.free[i + 1][1];
      this.free.splice(i + 1, 1);
    }
    if (i > 0 && this.free[i - 1][0] + this.free[i - 1][1] === off) {
      this.free[i - 1][1] += this.free[i][1];
      this.free.splice(i, 1);
      i--;
    }
    const last = this.free[this.free.length - 1];
    if (last && last[0] + last[1] === this.top) {
      this.top = last[0];
      this.free.pop();
    }
  }

  private ensure(end: number): void {
    const have = this.memory.buffer.byteLength;
    if (end <= have) return;
    const pages = Math.ceil((end - have) / PAGE), cur = have / PAGE;
    if (cur + pages > MAX_PAGES) throw errors.notSupported(`Kernel memory beyond ${MAX_PAGES / 16384} GiB (${Math.ceil(end / 2 ** 20)} MiB asked)`);
    // grow by at least a quarter to keep the number of grow calls small
    this.memory.grow(Math.min(MAX_PAGES - cur, Math.max(pages, Math.ceil(cur / 4))));
  }

  f64(off: number, len: number): Float64Array {
    return new Float64Array(this.memory.buffer, off, len);
  }

  i32(off: number, len: number): Int32Array {
    return new Int32Array(this.memory.buffer, off, len);
  }

  u32(off: number, len: number): Uint32Array {
    return new Uint32Array(this.memory.buffer, off, len);
  }

  u8(off: number, len: number): Uint8Array {
    return new Uint8Array(this.memory.buffer, off, len);
  }

  /** Copy a typed array into a new block; returns its offset. */
  put(data: Float64Array | Int32Array | Uint32Array | Uint8Array): number {
    const off = this.alloc(data.byteLength);
    new Uint8Array(this.memory.buffer, off, data.byteLength).set(new Uint8Array(data.buffer, data.byteOffset, data.byteLength));
    return off;
  }
}
