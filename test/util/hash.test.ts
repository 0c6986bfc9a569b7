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
