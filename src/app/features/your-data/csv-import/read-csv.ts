import { MAX_IMPORT_BYTES } from '@shared/import/read-export-file';

import { parseCsvFile, type CsvParseMessage } from './parse-csv-file';

/** A spreadsheet read for import: its header and rows, or why it cannot be imported. */
export type CsvFileRead = { readonly headers: string[]; readonly rows: string[][] } | { readonly problem: string };

/** True when the start of a file has bytes no text file has (a picture or a document renamed .csv). */
async function looksBinary(file: Blob): Promise<boolean> {
  const head = new Uint8Array(await file.slice(0, 4096).arrayBuffer());
  return head.includes(0);
}

/**
 * Reads a CSV file in a Web Worker with papaparse (on the main thread only where workers are
 * missing), reporting progress. Refuses a file too large, not text, or without rows.
 */
export async function readCsv(file: Blob, onProgress: (fraction: number) => void = () => {}): Promise<CsvFileRead> {
  if (file.size > MAX_IMPORT_BYTES)
    return { problem: `This file is larger than ${MAX_IMPORT_BYTES / 1024 / 1024} MB. Split it into smaller files. Nothing was changed.` };
  if (file.size === 0 || (await looksBinary(file))) return { problem: 'This file is not a CSV spreadsheet (it holds no text). Nothing was changed.' };
  const parsed: string[][] = [];
  const done = await new Promise<Exclude<CsvParseMessage, { kind: 'rows' }>>((resolve) => {
    const handle = (message: CsvParseMessage) => {
      if (message.kind !== 'rows') return resolve(message);
      for (const row of message.rows) parsed.push(row);
      onProgress(message.fraction);
    };
    let worker: Worker | null = null;
    try {
      worker = new Worker(new URL('./csv-parse.worker', import.meta.url), { type: 'module' });
    } catch {
      worker = null;
    }
    if (!worker) {
      parseCsvFile(file, handle);
      return;
    }
    worker.addEventListener('message', ({ data }: MessageEvent<CsvParseMessage>) => {
      handle(data);
      if (data.kind !== 'rows') worker.terminate();
    });
    worker.addEventListener('error', () => {
      worker.terminate();
      parsed.length = 0; // read again from the start, here
      parseCsvFile(file, handle);
    });
    worker.postMessage({ file });
  });
  if (done.kind === 'failed') return { problem: `This file could not be read as CSV (${done.message}). Nothing was changed.` };
  const [headers, ...rows] = parsed;
  if (!headers || rows.length === 0) return { problem: 'This file has no rows under its header. Nothing was changed.' };
  return { headers: headers.map((header) => header.replace(/^\uFEFF/, '').trim()), rows };
}
