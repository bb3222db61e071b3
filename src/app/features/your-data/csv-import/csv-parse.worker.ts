import { parseCsvFile, type CsvParseRequest } from './parse-csv-file';

/** Parses a spreadsheet off the main thread, so the page stays responsive on a large file. */
addEventListener('message', ({ data }: MessageEvent<CsvParseRequest>) => {
  parseCsvFile(data.file, (message) => postMessage(message));
});
