export type {
  Column, ColumnKind, ColumnOrigin, ColumnSchema, CategoricalColumn, Dataset, Frame, NumericColumn, Schema, Target,
} from './frame.js';
export { isCategorical, isNumeric } from './frame.js';
export { takeDataset, takeRows } from './dataset.js';
export { dataFingerprint, frameFingerprint, schemaFingerprint } from './fingerprint.js';
