import { existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDuckReader } from '../../src/table/load-duck-reader.js';

// src/table/duckdb.ts is written separately; until it exists the loader must say so clearly.
describe('loadDuckReader(what)', () => {
  it('returns the reader when src/table/duckdb.ts exists, else a clear error', async () => {
    if (existsSync('src/table/duckdb.ts')) expect(typeof (await loadDuckReader('x'))).toBe('function');
    else await expect(loadDuckReader('"flights.parquet"')).rejects.toThrow('Reading "flights.parquet" needs the DuckDB reader (src/table/duckdb.ts), which is not available.');
  });
});
