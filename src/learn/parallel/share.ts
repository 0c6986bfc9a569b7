/**
 * Copy the typed arrays inside a plain value into SharedArrayBuffer-backed twins, so posting the value
 * to worker threads shares the bytes instead of copying them per worker.
 */
type Typed = Float64Array | Float32Array | Int32Array | Uint32Array | Uint8Array | Int16Array | Uint16Array | Int8Array;

function isTyped(v: unknown): v is Typed {
  return ArrayBuffer.isView(v) && !(v instanceof DataView);
}

/**
 * A deep copy of `value` whose typed arrays live in shared memory (other values are kept as they are).
 * @example
 * const shared = toShared({ frame, weights }); // post to workers without copying the columns
 */
export function toShared<T>(value: T): T {
  if (isTyped(value)) {
    if (value.buffer instanceof SharedArrayBuffer) return value;
    const Ctor = value.constructor as new (b: SharedArrayBuffer) => Typed;
    const out = new Ctor(new SharedArrayBuffer(value.byteLength));
    out.set(value as never);
    return out as T;
  }
  if (Array.isArray(value)) return value.map((v) => toShared(v)) as T;
  if (value !== null && typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = toShared(v);
    return out as T;
  }
  return value;
}
