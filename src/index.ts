/**
 * coppice — the flat public API. Each layer keeps its own list in its `index.ts`;
 * this file only gathers them.
 */
export { CoppiceError, errors } from './errors.js';
export { show } from './notebook/show.js';
export * from './util/index.js';
export * from './table/index.js';
export * from './learn/index.js';
export * from './assess/index.js';
export * from './explain/index.js';
export * from './charts/index.js';
export * from './notebook/index.js';
