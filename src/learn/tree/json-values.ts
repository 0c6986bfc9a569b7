/**
 * JSON helpers for the model file: numbers JSON cannot hold (NaN, ±Infinity) are written as
 * `{ "$number": "NaN" | "Infinity" | "-Infinity" }`, and readers that check a parsed value's type and
 * range, failing with a `bad-model` error that names the field path.
 */
import { errors } from '../../errors.js';

export type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };

/** A number as JSON: itself when finite, a tagged string otherwise. */
export function encodeNumber(x: number): number | { $number: string } {
  return Number.isFinite(x) ? x : { $number: String(x) };
}

function isTagged(v: unknown): v is { $number: string } {
  return typeof v === 'object' && v !== null && !Array.isArray(v) && Object.keys(v).length === 1 && '$number' in v;
}

/** Read a number written by `encodeNumber`. */
export function decodeNumber(v: unknown, path: string): number {
  if (typeof v === 'number') return v;
  if (isTagged(v)) {
    if (v.$number === 'NaN') return NaN;
    if (v.$number === 'Infinity') return Infinity;
    if (v.$number === '-Infinity') return -Infinity;
  }
  throw errors.badModel(`${path} should be a number`);
}

/** Any plain value (settings) as JSON; non-finite numbers tagged, typed arrays as plain arrays. */
export function encodeValue(v: unknown): JsonValue {
  if (v === null || typeof v === 'boolean' || typeof v === 'string') return v;
  if (typeof v === 'number') return encodeNumber(v);
  if (ArrayBuffer.isView(v)) return Array.from(v as unknown as ArrayLike<number>, (x) => encodeNumber(x));
  if (Array.isArray(v)) return v.map((x) => encodeValue(x));
  if (typeof v === 'object') {
    const out: { [key: string]: JsonValue } = {};
    for (const [k, x] of Object.entries(v as Record<string, unknown>)) if (x !== undefined) out[k] = encodeValue(x);
    return out;
  }
  return null; // functions, undefined, symbols: not data
}

/** Inverse of `encodeValue` (tagged numbers back to numbers). */
export function decodeValue(v: unknown, path: string): unknown {
  if (v === null || typeof v === 'boolean' || typeof v === 'string' || typeof v === 'number') return v;
  if (isTagged(v)) return decodeNumber(v, path);
  if (Array.isArray(v)) return v.map((x, i) => decodeValue(x, `${path}[${i}]`));
  if (typeof v === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, x] of Object.entries(v as Record<string, unknown>)) out[k] = decodeValue(x, `${path}.${k}`);
    return out;
  }
  throw errors.badModel(`${path} has an unsupported value`);
}

export function readObject(v: unknown, path: string): Record<string, unknown> {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) throw errors.badModel(`${path} should be an object`);
  return v as Record<string, unknown>;
}

export function readString(v: unknown, path: string): string {
  if (typeof v !== 'string') throw errors.badModel(`${path} should be a string`);
  return v;
}

export function readInt(v: unknown, path: string, min = -2147483648, max = 2147483647): number {
  if (typeof v !== 'number' || !Number.isInteger(v) || v < min || v > max) {
    throw errors.badModel(`${path} should be an integer in ${min}..${max}`);
  }
  return v;
}

export function readArray(v: unknown, path: string, length?: number): unknown[] {
  if (!Array.isArray(v)) throw errors.badModel(`${path} should be an array`);
  if (length !== undefined && v.length !== length) throw errors.badModel(`${path} should have ${length} entries, not ${v.length}`);
  return v;
}

/** A Float64Array from numbers (tagged non-finite numbers allowed when `finite` is false). */
export function readFloats(v: unknown, path: string, length?: number, finite = true): Float64Array {
  const a = readArray(v, path, length);
  const out = new Float64Array(a.length);
  for (let i = 0; i < a.length; i++) {
    const x = decodeNumber(a[i], `${path}[${i}]`);
    if (finite && !Number.isFinite(x)) throw errors.badModel(`${path}[${i}] should be a finite number`);
    out[i] = x;
  }
  return out;
}

/** Integers in [min, max] as plain numbers. */
export function readInts(v: unknown, path: string, length: number | undefined, min: number, max: number): number[] {
  const a = readArray(v, path, length);
  for (let i = 0; i < a.length; i++) readInt(a[i], `${path}[${i}]`, min, max);
  return a as number[];
}

/** Typed arrays and plain number arrays as JSON arrays with tagged non-finite numbers. */
export function encodeFloats(a: ArrayLike<number>): (number | { $number: string })[] {
  return Array.from(a, (x) => encodeNumber(x));
}
