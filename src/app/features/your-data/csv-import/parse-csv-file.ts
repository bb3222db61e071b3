import Papa from 'papaparse';

export interface CsvParseRequest {
  readonly file: Blob;
}

/** What the parser reports: how far it is, then every row (the first is the header), or why it failed. */
export type CsvParseMessage =
  | { readonly kind: 'progress'; readonly fraction: number }
  | { readonly kind: 'done'; readonly rows: string[][]; readonly errors: string[] }
  | { readonly kind: 'failed'; readonly message: string };

/** Parses a CSV file with papaparse (delimiter and line breaks detected), chunk by chunk. */
export function parseCsvFile(file: Blob, report: (message: CsvParseMessage) => void): void {
  const rows: string[][] = [];
  const errors: string[] = [];
  Papa.parse<string[]>(file as File, {
    skipEmptyLines: 'greedy',
    chunkSize: 512 * 1024,
    chunk: (results) => {
      for (const row of results.data) rows.push(row);
      for (const error of results.errors.slice(0, 20 - errors.length)) errors.push(`row ${(error.row ?? 0) + 1}: ${error.message}`);
      report({ kind: 'progress', fraction: file.size === 0 ? 1 : Math.min(1, results.meta.cursor / file.size) });
    },
    complete: () => report({ kind: 'done', rows, errors }),
    error: (error) => report({ kind: 'failed', message: error.message }),
  });
}
