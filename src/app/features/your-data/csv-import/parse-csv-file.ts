import Papa from 'papaparse';

export interface CsvParseRequest {
  readonly file: Blob;
}

/** Rows sent in one message: taking in a whole large file's rows at once was a long task on the page. */
const ROWS_PER_MESSAGE = 1000;

/** What the parser reports: rows as it reads them (the first is the header) with how far it is, then the end, or why it failed. */
export type CsvParseMessage =
  | { readonly kind: 'rows'; readonly rows: string[][]; readonly fraction: number }
  | { readonly kind: 'done'; readonly errors: string[] }
  | { readonly kind: 'failed'; readonly message: string };

/** Parses a CSV file with papaparse (delimiter and line breaks detected), chunk by chunk. */
export function parseCsvFile(file: Blob, report: (message: CsvParseMessage) => void): void {
  const errors: string[] = [];
  Papa.parse<string[]>(file as File, {
    skipEmptyLines: 'greedy',
    chunkSize: 512 * 1024,
    chunk: (results) => {
      for (const error of results.errors.slice(0, 20 - errors.length)) errors.push(`row ${(error.row ?? 0) + 1}: ${error.message}`);
      const fraction = file.size === 0 ? 1 : Math.min(1, results.meta.cursor / file.size);
      for (let start = 0; start < results.data.length; start += ROWS_PER_MESSAGE) {
        report({ kind: 'rows', rows: results.data.slice(start, start + ROWS_PER_MESSAGE), fraction });
      }
    },
    complete: () => report({ kind: 'done', errors }),
    error: (error) => report({ kind: 'failed', message: error.message }),
  });
}
