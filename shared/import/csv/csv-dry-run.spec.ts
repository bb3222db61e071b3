import { bookKeys } from '../../duplicates/book-keys';
import { csvDryRun, csvDryRunSteps } from './csv-dry-run';
import type { CsvImportOptions } from './csv-row';

const options = (overrides: Partial<CsvImportOptions> = {}): CsvImportOptions => ({
  mapping: ['title', 'authors', 'isbn', 'status', 'rating', 'finishedOn', null],
  dateFormat: 'dd/MM/yyyy',
  statuses: new Map([['Shelved', 'tbr']]),
  keepBooksWithBadIsbn: false,
  ...overrides,
});

const rows = [
  ['Harbour of Small Lights', 'Odile Ferrant', '0-306-40615-2', 'Read', '4', '12/03/2025', 'ignored'],
  ['A Kettle for Winter', 'Bram Ostrander', '', 'Shelved', '', '', ''],
  ['The Glass Orchard', 'Pia Lund', '978-0-306-40615-8', 'Read', '9', '31/02/2025', ''],
  ['Ninefold', 'Ada Roe', '', 'Lost', '', '', ''],
  ['harbour of small lights!', 'Odile  Ferrant', '', 'Read', '', '', ''],
  ['', '', '', '', '', '', ''],
];

describe('csvDryRun', () => {
  it('lists what would be added and every refused row with all its reasons', () => {
    const run = csvDryRun(rows, options(), new Set());
    expect(run.additions.map((a) => a.row)).toEqual([1, 2]);
    const [first] = run.additions;
    expect(first!.book).toEqual(
      jasmine.objectContaining({ title: 'Harbour of Small Lights', authors: ['Odile Ferrant'], isbn: '9780306406157', status: 'finished', rating: 4 }),
    );
    expect(first!.reading).toEqual(jasmine.objectContaining({ finishedOn: '2025-03-12', rating: 4 }));
    expect(run.additions[1]!.reading).toBeNull();
    expect(run.refused).toEqual([
      { row: 3, reasons: ['ISBN "978-0-306-40615-8" has a wrong check digit', 'rating "9" is not between 0.5 and 5', 'date "31/02/2025" is not a DD/MM/YYYY date'] },
      { row: 4, reasons: ['status "Lost" is not one we know (map it to a status)'] },
    ]);
    expect(run.duplicates).toEqual([{ row: 5, title: 'harbour of small lights!' }]);
  });

  it('imports a book with a wrong ISBN without it when the reader chooses', () => {
    const run = csvDryRun([rows[2]!.map((cell, i) => (i === 4 || i === 5 ? '' : cell))], options({ keepBooksWithBadIsbn: true }), new Set());
    expect(run.additions[0]!.book['isbn']).toBeNull();
    expect(run.additions[0]!.notes).toEqual(['ISBN "978-0-306-40615-8" has a wrong check digit: imported without it']);
  });

  it('leaves out books already in the library', () => {
    const library = new Set(bookKeys({ title: 'A Kettle for Winter', authors: ['Ostrander, Bram'] }));
    expect(csvDryRun(rows.slice(0, 2), options(), library).duplicates).toEqual([{ row: 2, title: 'A Kettle for Winter' }]);
  });

  it('plans the same a slice at a time, yielding how far it has got', () => {
    const steps = csvDryRunSteps(rows, options(), new Set(), 2);
    const yielded: number[] = [];
    let step = steps.next();
    for (; !step.done; step = steps.next()) yielded.push(step.value);
    expect(yielded).toEqual(Array.from({ length: Math.ceil(rows.length / 2) - 1 }, (_, n) => (n + 1) * 2));
    expect(step.value).toEqual(csvDryRun(rows, options(), new Set()));
  });
});
