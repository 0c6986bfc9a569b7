import { describe, expect, it } from 'vitest';
import { Fnv64 } from '../../src/util/hash.js';

describe('Fnv64', () => {
  // Published FNV-1a 64-bit test vectors (Fowler/Noll/Vo, "FNV hash" reference test suite):
  // "" -> cbf29ce484222325, "a" -> af63dc4c8601ec8c, "foobar" -> 85944171f73967e8.
  it('matches the published FNV-1a 64-bit test vectors', () => {
    const enc = (s: string) => new TextEncoder().encode(s);
    expect(new Fnv64().bytes(enc('')).hex()).toBe('cbf29ce484222325');
    expect(new Fnv64().bytes(enc('a')).hex()).toBe('af63dc4c8601ec8c');
    expect(new Fnv64().bytes(enc('foobar')).hex()).toBe('85944171f73967e8');
  });
});

describe('Fnv64.typed(array)', () => {
  it('changes when any value changes, and not otherwise', () => {
    const a = Float64Array.from({ length: 1000 }, (_, i) => i * 0.5);
    const h = (x: Float64Array) => new Fnv64().typed(x).hex();
    const base = h(a);
    expect(h(a.slice())).toBe(base);
    for (const i of [0, 1, 499, 999]) {
      const b = a.slice(); b[i] += 1e-9;
      expect(h(b)).not.toBe(base);
    }
    expect(h(a.subarray(0, 999))).not.toBe(base);
  });

  it('hashes unaligned views and odd byte lengths', () => {
    const raw = Uint8Array.from({ length: 11 }, (_, i) => i);
    const view = raw.subarray(1); // byteOffset 1
    const copy = raw.slice(1);
    expect(new Fnv64().typed(view).hex()).toBe(new Fnv64().typed(copy).hex());
  });
});
