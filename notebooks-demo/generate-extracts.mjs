#!/usr/bin/env node
/**
 * Demo data for coppice: an invented produce co-operative, Larkfield Fresh, ships pallets of vegetables and fruit
 * from its growers to shops. At each shop's receiving dock some of a pallet is written off as spoiled; the co-op
 * wants to predict that share (`waste_pct`, percent of the pallet's weight) before a truck leaves, so it can reroute
 * or repack the riskiest pallets.
 *
 * Two extracts are generated with coppice's seeded generator (xoshiro128**, src/util/rng.ts):
 * - data/pallets-spring.csv  — March to May, the baseline;
 * - data/pallets-summer.csv  — June to August, the refresh, with three planted changes:
 *     1. a new category: raspberries join the crops (about 8% of pallets, the most perishable crop);
 *     2. a shifted feature: trucks run warmer in summer (truck_temp_c mean 4.0 → 6.0 °C, wider spread);
 *     3. a changed relationship: a new sealed-film supplier's film fogs, so sealed film no longer cuts waste.
 * Everything here is invented; no real firm or dataset is described.
 *
 * Usage: node notebooks-demo/generate-extracts.mjs [--force]   (needs the built package: npm run build)
 */
import { existsSync, mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createRng } from '../dist/util/rng.js';

const here = dirname(fileURLToPath(import.meta.url));
const dataDir = join(here, 'data');

const CROPS = {
  //           share   base waste %   extra waste per °C above 4 (relative)   leafy / berry
  tomato: { share: 0.22, base: 2.0, heat: 0.10 },
  lettuce: { share: 0.18, base: 3.4, heat: 0.20, leafy: true },
  strawberry: { share: 0.15, base: 5.2, heat: 0.24, berry: true },
  pepper: { share: 0.15, base: 1.2, heat: 0.06 },
  cucumber: { share: 0.15, base: 1.5, heat: 0.08 },
  spinach: { share: 0.15, base: 4.4, heat: 0.22, leafy: true },
  raspberry: { share: 0, base: 6.5, heat: 0.26, berry: true },
};
const REGIONS = { north_valley: [14, 22], river_flats: [4, 10], hill_terraces: [8, 16], coastal_strip: [2, 7] };
const STORES = ['hypermarket', 'supermarket', 'corner_shop'];

function pick(rng, weights) {
  const entries = Object.entries(weights);
  let u = rng.next() * entries.reduce((s, [, w]) => s + w, 0);
  for (const [k, w] of entries) { if ((u -= w) < 0) return k; }
  return entries[entries.length - 1][0];
}

function isoDay(start, offset) {
  return new Date(Date.UTC(start[0], start[1] - 1, start[2] + offset)).toISOString().slice(0, 10);
}

/** One season of pallets. */
function season({ seed, rows, start, days, summer }) {
  const rng = createRng(seed);
  const cropShares = Object.fromEntries(Object.entries(CROPS).map(([k, c]) => [k, k === 'raspberry' ? (summer ? 0.09 : 0) : c.share]));
  const out = [];
  for (let i = 0; i < rows; i++) {
    const crop = pick(rng, cropShares);
    const c = CROPS[crop];
    const region = pick(rng, { north_valley: 0.3, river_flats: 0.3, hill_terraces: 0.2, coastal_strip: 0.2 });
    const [lo, hi] = REGIONS[region];
    const transit = lo + (hi - lo) * rng.next() + Math.abs(rng.normal()) * 2;
    const packaging = c.berry ? pick(rng, { clamshell: 0.7, open_crate: 0.2, sealed_film: 0.1 })
      : c.leafy ? pick(rng, { sealed_film: 0.6, open_crate: 0.3, clamshell: 0.1 })
      : pick(rng, { open_crate: 0.6, sealed_film: 0.3, clamshell: 0.1 });
    const harvestHours = 8 + transit + 30 * -Math.log(1 - rng.next() * 0.95);
    const temp = summer ? 6.0 + 1.5 * rng.normal() : 4.0 + 1.2 * rng.normal();
    const stops = rng.int(7);
    const kg = Math.round(250 + 400 * rng.next());
    const store = STORES[rng.int(3)];
    let pack = 0;
    if (packaging === 'clamshell' && c.berry) pack = -1.5;
    if (packaging === 'sealed_film') pack = summer ? 0.3 : (c.leafy ? -1.3 : -0.4);
    const heat = Math.exp(c.heat * (temp - 4));
    const age = 1 + 0.012 * (harvestHours - 24);
    const corner = store === 'corner_shop' ? 0.3 : 0;
    let waste = c.base * heat * age + 0.22 * stops + pack + corner + 0.55 * rng.normal();
    waste = Math.max(0, Math.round(waste * 100) / 100);
    const loggerFailed = rng.next() < 0.02;
    out.push({
      shipped_on: isoDay(start, rng.int(days)), crop, grower_region: region, packaging,
      hours_since_harvest: Math.round(harvestHours * 10) / 10, transit_hours: Math.round(transit * 10) / 10,
      truck_temp_c: loggerFailed ? '' : Math.round(temp * 10) / 10, stops_before: stops, pallet_kg: kg,
      store_format: store, waste_pct: waste,
    });
  }
  return out;
}

function toCsv(rows) {
  const cols = Object.keys(rows[0]);
  return `${cols.join(',')}\n${rows.map((r) => cols.map((k) => r[k]).join(',')).join('\n')}\n`;
}

function writeFileAtomic(path, text) {
  const temp = `${path}.${process.pid}.tmp`;
  writeFileSync(temp, text);
  renameSync(temp, path);
}

export function generateExtracts({ force = false } = {}) {
  mkdirSync(dataDir, { recursive: true });
  const files = {
    'pallets-spring.csv': { seed: 20250301, rows: 3000, start: [2025, 3, 1], days: 92, summer: false },
    'pallets-summer.csv': { seed: 20250601, rows: 3000, start: [2025, 6, 1], days: 92, summer: true },
  };
  const written = [];
  for (const [name, spec] of Object.entries(files)) {
    const path = join(dataDir, name);
    if (existsSync(path) && !force) continue;
    writeFileAtomic(path, toCsv(season(spec)));
    written.push(path);
  }
  return written;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const written = generateExtracts({ force: process.argv.includes('--force') });
  process.stdout.write(written.length ? `wrote ${written.join(', ')}\n` : 'extracts already present (use --force to regenerate)\n');
}
