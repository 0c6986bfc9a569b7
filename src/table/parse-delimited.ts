/**
 * Delimited text (CSV, TSV) into rows of strings, strictly: every record must have as many fields as the
 * header. Quoting follows RFC 4180 (Shafranovich 2005, "Common Format and MIME Type for Comma-Separated
 * Values (CSV) Files"): a field that starts with a double quote runs to the next lone quote, may hold
 * delimiters and line breaks, and writes a quote as two quotes. Line breaks may be LF, CRLF or CR.
 */
import { errors } from '../errors.js';

/** The header and, for each header field, the column of field texts (one per record). */
export interface DelimitedColumns {
  readonly header: readonly string[];
  readonly columns: readonly (readonly string[])[];
  readonly nRows: number;
}

const QUOTE = 34, LF = 10, CR = 13;

function checkHeader(header: readonly string[], path: string): void {
  const seen = new Set<string>();
  header.forEach((name, k) => {
    if (name.trim() === '') throw errors.badHeader(path, `field ${k + 1} is empty`);
    if (seen.has(name)) throw errors.badHeader(path, `names column ${JSON.stringify(name)} twice`);
    seen.add(name);
  });
}

/**
 * Split delimited text into a header and columns of field texts, checking that every record has the
 * header's field count (an error names the 1-based line where the record starts).
 * Lines that are completely empty are skipped (common practice). A leading byte-order mark is ignored.
 * `path` is only used in error messages.
 *
 * @example parseDelimited('a,b\n1,"x, y"\n', ',', 'inline.csv').columns // [['1'], ['x, y']]
 */
export function parseDelimited(text: string, delimiter: string, path: string): DelimitedColumns {
  if (delimiter.length !== 1 || delimiter === '"' || delimiter === '\n' || delimiter === '\r') {
    throw errors.badOption('delimiter', delimiter, 'one character other than a quote or line break');
  }
  const delim = delimiter.charCodeAt(0);
  const n = text.length;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  let line = 1;
  let header: string[] | null = null;
  let columns: string[][] = [];
  let nRows = 0;
  const fields: string[] = [];

  while (i < n) {
    const startLine = line;
    // an empty line: skip it
    const c0 = text.charCodeAt(i);
    if (c0 === LF || c0 === CR) {
      i += c0 === CR && text.charCodeAt(i + 1) === LF ? 2 : 1;
      line++;
      continue;
    }
    fields.length = 0;
    for (;;) {
      // one field, starting at i
      if (text.charCodeAt(i) === QUOTE) {
        const quoteLine = line;
        let j = i + 1;
        let value = '';
        let chunkStart = j;
        for (;;) {
          if (j >= n) throw errors.unclosedQuote(path, quoteLine);
          const c = text.charCodeAt(j);
          if (c === QUOTE) {
            if (text.charCodeAt(j + 1) === QUOTE) { value += text.slice(chunkStart, j + 1); j += 2; chunkStart = j; continue; }
            break;
          }
          if (c === LF) line++;
          else if (c === CR && text.charCodeAt(j + 1) !== LF) line++;
          j++;
        }
        value += text.slice(chunkStart, j);
        fields.push(value);
        i = j + 1;
        const after = i < n ? text.charCodeAt(i) : -1;
        if (after !== -1 && after !== delim && after !== LF && after !== CR) throw errors.strayQuote(path, line);
      } else {
        let j = i;
        while (j < n) {
          const c = text.charCodeAt(j);
          if (c === delim || c === LF || c === CR) break;
          j++;
        }
        fields.push(text.slice(i, j));
        i = j;
      }
      // after a field: delimiter (another field follows), line break or end of text (record ends)
      if (i >= n) break;
      const c = text.charCodeAt(i);
      if (c === delim) { i++; continue; }
      i += c === CR && text.charCodeAt(i + 1) === LF ? 2 : 1;
      line++;
      break;
    }
    if (header === null) {
      header = fields.slice();
      checkHeader(header, path);
      columns = header.map(() => []);
      continue;
    }
    if (fields.length !== header.length) throw errors.raggedRow(path, startLine, header.length, fields.length);
    for (let k = 0; k < fields.length; k++) columns[k].push(fields[k]);
    nRows++;
  }
  if (header === null) throw errors.badHeader(path, 'is missing: the file is empty');
  return { header, columns, nRows };
}
