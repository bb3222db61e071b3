import { parseCsvFile, type CsvParseMessage } from './parse-csv-file';

/** Every message of one parse, up to its last. */
function parse(file: Blob): Promise<CsvParseMessage[]> {
  return new Promise((resolve) => {
    const messages: CsvParseMessage[] = [];
    parseCsvFile(file, (message) => {
      messages.push(message);
      if (message.kind !== 'rows') resolve(messages);
    });
  });
}

describe('parseCsvFile', () => {
  it('sends a large file’s rows in order, a thousand at most a message, so the page takes them in short tasks', async () => {
    // RFC 4180 §2: a quoted field may hold commas, CRLF line breaks and doubled quotes.
    const lines = ['Title,Notes', ...Array.from({ length: 2_500 }, (_, n) => `Book ${n},"said ""hello"", then\r\nleft"`)];
    const messages = await parse(new Blob([lines.join('\r\n')], { type: 'text/csv' }));
    const batches = messages.flatMap((message) => (message.kind === 'rows' ? [message] : []));
    const rows = batches.flatMap((batch) => batch.rows);
    expect(batches.length).toBeGreaterThan(2);
    expect(batches.every((batch) => batch.rows.length <= 1_000)).toBeTrue();
    expect(rows.length).toBe(2_501);
    expect(rows[0]).toEqual(['Title', 'Notes']);
    expect(rows[2_500]).toEqual(['Book 2499', 'said "hello", then\r\nleft']);
    expect(batches.at(-1)!.fraction).toBe(1);
    expect(messages.at(-1)).toEqual({ kind: 'done', errors: [] });
  });
});
