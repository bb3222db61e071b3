import { readExportFile } from './read-export-file';

describe('readExportFile', () => {
  it('reads an export, with or without a byte order mark', () => {
    const text = JSON.stringify({ format: 'lamplight-export', version: 1, exportedAt: '2026-12-04T10:00:00.000Z', collections: { books: [] } });
    expect('file' in readExportFile(text)).toBeTrue();
    expect('file' in readExportFile(`\uFEFF${text}`)).toBeTrue();
  });

  it('says why a file is not one it can import', () => {
    const problem = (text: string) => {
      const read = readExportFile(text);
      return 'problem' in read ? read.problem : '';
    };
    expect(problem('title,author\r\nA,B')).toContain('not JSON');
    expect(problem('{"books":[]}')).toContain('not a Lamplight export');
    expect(problem('[1,2]')).toContain('not a Lamplight export');
    expect(problem('{"format":"lamplight-export","version":2,"collections":{}}')).toContain('newer Lamplight');
    expect(problem('{"format":"lamplight-export","version":"1","collections":{}}')).toContain('no version');
    expect(problem('{"format":"lamplight-export","version":1}')).toContain('no collections');
  });
});
