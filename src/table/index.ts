export type {
  Column, ColumnKind, ColumnOrigin, ColumnSchema, CategoricalColumn, Dataset, Frame, NumericColumn, Schema, Target,
} from './frame.js';
export { isCategorical, isNumeric } from './frame.js';
export { takeDataset, takeRows } from './dataset.js';
export { dataFingerprint, frameFingerprint, schemaFingerprint } from './fingerprint.js';

// --- reading extracts, frames, datasets, alignment (task A) ---
export { readExtract } from './read-extract.js';
export type { ExtractFormat, ReadExtractOptions } from './read-extract.js';
export type { CellOptions } from './columns-table.js';
export type { DuckReader, DuckSource } from './load-duck-reader.js';
export { readDelimitedText } from './read-delimited.js';
export { readJsonText } from './read-json.js';
export { parseDelimited } from './parse-delimited.js';
export type { DelimitedColumns } from './parse-delimited.js';
export { isIsoDateText, parseIsoDate } from './iso-date.js';
export { DATE_PARTS, datePart } from './date-parts.js';
export type { DatePart } from './date-parts.js';
export { toFrame } from './to-frame.js';
export type { ToFrameOptions } from './frame-options.js';
export type { TableInput } from './raw-table.js';
export { isFrame } from './raw-table.js';
export { makeFrame } from './make-frame.js';
export { toDataset } from './to-dataset.js';
export type { ToDatasetOptions } from './to-dataset.js';
export type { TaskKind } from './encode-target.js';
export { alignFrame } from './align-frame.js';
export type { AlignReport } from './align-frame.js';
export { glance } from './glance.js';
export type { GlanceRow } from './glance.js';
export type { EncodedKind } from './value-counts.js';
export { featureRangesOf } from './ranges.js';
export type { TrainingRanges } from './ranges.js';
// Binning and big extracts (speed engine)
export { MISSING_BIN, binFrame } from './bin-frame.js';
export type { BinnedFeature, BinnedFrame, BinOptions } from './bin-frame.js';
export { binnedFrameFor, cachedBinnedFrame, rememberBinnedFrame } from './bin-cache.js';
export type { BinCacheOptions } from './bin-cache.js';
export { QuantileSketch } from './bin-sketch.js';
export { readWithDuckDB } from './duckdb.js';
export { streamFrameWithDuckDB } from './duckdb-stream.js';
