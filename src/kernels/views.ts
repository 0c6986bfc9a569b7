/** Whole-memory typed views for the TypeScript kernel twins, rebuilt only when the buffer changes (growth). */
export interface Views {
  readonly f64: Float64Array;
  readonly i32: Int32Array;
  readonly u32: Uint32Array;
  readonly u8: Uint8Array;
}

let last: { buf: ArrayBufferLike; views: Views } | null = null;

/** Views over all of `buf`. */
export function viewsOf(buf: ArrayBufferLike): Views {
  if (last && last.buf === buf) return last.views;
  const views = { f64: new Float64Array(buf), i32: new Int32Array(buf), u32: new Uint32Array(buf), u8: new Uint8Array(buf) };
  last = { buf, views };
  return views;
}
