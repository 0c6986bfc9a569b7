/**
 * The table type an extract magic binds. Generated code names it explicitly, because a type reached only
 * through coppice's own dependencies cannot be named in a cell's declarations.
 */
export type { ColumnTable as ExtractTable } from 'arquero';
