/**
 * Ranges of settings to search over: a list of values, an integer range, or a log-uniform range.
 */
import { errors } from '../errors.js';
import type { Rng } from '../util/rng.js';

export type SettingValue = number | string | boolean;

/** Integers low..high inclusive: every one in a grid, uniform in a random search. */
export interface IntRange { readonly kind: 'int'; readonly low: number; readonly high: number }
/** Numbers in [low, high] with log-uniform density (random search only). */
export interface LogRange { readonly kind: 'log'; readonly low: number; readonly high: number }

export type SettingRange = readonly SettingValue[] | IntRange | LogRange;

/** Settings to search: a range per setting name. */
export type SearchSpace = Readonly<Record<string, SettingRange>>;

/** One concrete setting: a value per name. */
export type Setting = Readonly<Record<string, SettingValue>>;

/**
 * An integer range, low..high inclusive.
 * @example
 * searchGrid(data, fit, { depth: intRange(2, 6) }); // depths 2, 3, 4, 5, 6
 */
export function intRange(low: number, high: number): IntRange {
  if (!Number.isInteger(low) || !Number.isInteger(high) || low > high) {
    throw errors.badOption('intRange', [low, high], 'integers with low <= high');
  }
  return { kind: 'int', low, high };
}

/**
 * A log-uniform range over [low, high], 0 < low <= high (for rates and penalties spanning magnitudes).
 * @example
 * searchRandom(data, fit, { rate: logRange(0.01, 0.3) }, { draws: 20 });
 */
export function logRange(low: number, high: number): LogRange {
  if (!(low > 0) || !(high >= low) || !Number.isFinite(high)) {
    throw errors.badOption('logRange', [low, high], 'finite numbers with 0 < low <= high');
  }
  return { kind: 'log', low, high };
}

const GRID_LIMIT = 10_000;

/** All values of a range for a grid; log ranges cannot be enumerated. */
export function gridValues(name: string, range: SettingRange): readonly SettingValue[] {
  if (Array.isArray(range)) {
    if (range.length === 0) throw errors.badOption(name, [], 'at least one value');
    return range as readonly SettingValue[];
  }
  const r = range as IntRange | LogRange;
  if (r.kind === 'int') {
    if (r.high - r.low + 1 > GRID_LIMIT) throw errors.badOption(name, [r.low, r.high], `at most ${GRID_LIMIT} grid values`);
    return Array.from({ length: r.high - r.low + 1 }, (_, i) => r.low + i);
  }
  if (r.kind === 'log') throw errors.badOption(name, 'logRange', 'a list or intRange in a grid (log ranges are for searchRandom)');
  throw errors.badOption(name, range, 'a list, intRange or logRange');
}

/** One random value of a range. */
export function drawValue(name: string, range: SettingRange, rng: Rng): SettingValue {
  if (Array.isArray(range)) {
    if (range.length === 0) throw errors.badOption(name, [], 'at least one value');
    return (range as readonly SettingValue[])[rng.int(range.length)];
  }
  const r = range as IntRange | LogRange;
  if (r.kind === 'int') return r.low + rng.int(r.high - r.low + 1);
  if (r.kind === 'log') return Math.exp(Math.log(r.low) + rng.next() * (Math.log(r.high) - Math.log(r.low)));
  throw errors.badOption(name, range, 'a list, intRange or logRange');
}
