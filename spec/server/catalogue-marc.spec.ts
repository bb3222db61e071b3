import { asIsbn13 } from 'isbn3';

import { parseExtent, playingTimeMinutes } from '../../sync-server/src/domain/catalogue/marc-extent';
import { parseMarcXml, type MarcRecord } from '../../sync-server/src/domain/catalogue/marc-record';
import { marcToBook } from '../../sync-server/src/domain/catalogue/marc-to-book';
import { inventedRecords } from '../../sync-server/src/local-catalogue/invented-records';
import { field008, leader, toMarcXml } from '../../sync-server/src/local-catalogue/marc-fields';
import { marcjsRead, marcjsXml } from '../support/marcjs';

/*
 * Sources: the Library of Congress "MARC 21 Format for Bibliographic Data" (each check names its
 * field's page, www.loc.gov/marc/bibliographic/bdNNN.html). Records are written as MARCXML by
 * marcjs (npm), so our reader is also checked against another library's writer.
 */
const BOOK = leader('a');

/** A book record with these fields, written by marcjs and read back by our parser. */
function record(fields: string[][], recordLeader = BOOK): MarcRecord {
  const records = parseMarcXml(marcjsXml(recordLeader, [['008', field008(2020, 'eng')], ...fields]));
  expect(records.length).toBe(1);
  return records[0]!;
}
const book = (fields: string[][], recordLeader = BOOK) => marcToBook(record(fields, recordLeader));

/** Our record in marcjs's shape, to compare field by field. */
function asMarcjsFields(marc: MarcRecord): string[][] {
  return [
    ...marc.controlFields.map((field) => [field.tag, field.value]),
    ...marc.dataFields.map((field) => [field.tag, field.ind1 + field.ind2, ...field.subfields.flatMap((s) => [s.code, s.value])]),
  ];
}

describe('MARC 21 bibliographic records as book fields', () => {
  describe('020 International Standard Book Number (bd020)', () => {
    it('reads the page’s record of five numbers: the three valid $a ISBNs, never the $z ones, as ISBN-13 (isbn3 as reference)', () => {
      // bd020: "Five numbers associated with one catalog record…"
      const found = book([
        ['020', '  ', 'a', '0877790086 :', 'c', '$10.00'],
        ['020', '  ', 'z', '0877790105', 'q', 'Fabrikoid', 'c', '$12.00'],
        ['020', '  ', 'a', '0877790019', 'q', 'black leather', 'z', '0877780116 :', 'c', '$14.00'],
        ['020', '  ', 'a', '0877790124', 'q', 'blue pigskin', 'c', '$15.00'],
        ['020', '  ', 'z', '0877790159', 'q', 'easel binding', 'c', '$16.00'],
        ['245', '00', 'a', 'Five bindings.'],
      ]);
      expect(found.isbns).toEqual(['0877790086', '0877790019', '0877790124'].map((isbn) => asIsbn13(isbn)!));
      expect(found.isbn).toBe(asIsbn13('0877790086')!);
    });

    it('reads $a with qualifiers in $q (bd020: 0914378260 $q pbk. $q v. 1) and with a qualifier written into $a (older records)', () => {
      expect(book([['020', '  ', 'a', '0914378260', 'q', 'pbk.', 'q', 'v. 1', 'c', '$5.00']]).isbns).toEqual([asIsbn13('0914378260')!]);
      expect(book([['020', '  ', 'a', '0491001304 (pbk.)']]).isbns).toEqual([asIsbn13('0491001304')!]);
      expect(book([['020', '  ', 'a', '978-1-999999-00-2 (hardback)']]).isbns).toEqual([]); // a wrong check digit (isbn3: asIsbn13 is null) is not an ISBN
    });
  });

  describe('100/700 personal names (bd100, bd700; first indicator: 0 forename, 1 surname, 3 family name)', () => {
    it('turns "Adams, Henry,$d1838-1918." (bd100) into "Henry Adams", and keeps forename and family entries as written', () => {
      expect(book([['100', '1 ', 'a', 'Adams, Henry,', 'd', '1838-1918.']]).authors).toEqual(['Henry Adams']);
      expect(book([['100', '0 ', 'a', 'John,', 'c', 'the Baptist, Saint.']]).authors).toEqual(['John']);
      expect(book([['100', '3 ', 'a', 'Farquhar family.']]).authors).toEqual(['Farquhar family']);
    });

    it('turns the issue’s "Asquith, Juniper, 1961-" into "Juniper Asquith", keeps initials, and leaves narrators and translators out', () => {
      const found = book([
        ['100', '1 ', 'a', 'Asquith, Juniper, 1961-'],
        ['700', '1 ', 'a', 'Ashby, N. K.,', 'e', 'author.'],
        ['700', '1 ', 'a', 'Brannagh, Ottoline,', 'e', 'narrator.'],
        ['700', '1 ', 'a', 'Duvernoy, Caspian,', '4', 'trl'],
      ]);
      expect(found.authors).toEqual(['Juniper Asquith', 'N. K. Ashby']);
    });
  });

  describe('245 title statement (bd245) and 250 edition (bd250)', () => {
    it('takes $a as the title and $b as the subtitle without the ISBD " :" and " /" (bd245: The DNA story)', () => {
      const found = book([['245', '14', 'a', 'The DNA story :', 'b', 'a documentary history of gene cloning /', 'c', 'James D. Watson, John Tooze.']]);
      expect(found.title).toBe('The DNA story');
      expect(found.subtitle).toBe('a documentary history of gene cloning');
    });

    it('drops the closing period of a title but keeps the edition’s abbreviation ("2nd ed.")', () => {
      const found = book([
        ['245', '10', 'a', 'Moths of the lower fen.'],
        ['250', '  ', 'a', '2nd ed.'],
      ]);
      expect(found.title).toBe('Moths of the lower fen');
      expect(found.edition).toBe('2nd ed.');
    });
  });

  describe('264 and 260 publication (bd264: second indicator 1 publication, 4 copyright; bd260)', () => {
    it('takes the publisher and year of publication, not of copyright, and falls back to 260 and then 008/07-10', () => {
      const both = book([
        ['264', ' 1', 'a', 'Eastmere :', 'b', '[Quayside Books],', 'c', '[2019]'],
        ['264', ' 4', 'c', '©2018'],
      ]);
      expect([both.publisher, both.year]).toEqual(['Quayside Books', 2019]);
      const older = book([['260', '  ', 'a', 'Eastmere :', 'b', 'Quayside Books,', 'c', 'c1998.']]);
      expect([older.publisher, older.year]).toEqual(['Quayside Books', 1998]);
      expect(book([]).year).toBe(2020); // from 008/07-10
    });
  });

  describe('300 physical description (bd300), 306 playing time (bd306) and the leader', () => {
    it('reads page counts from extents: the main sequence, not the roman preliminaries', () => {
      expect(parseExtent('xii, 345 pages ;').pages).toBe(345); // the example
      expect(parseExtent('149 p. ;').pages).toBe(149); // bd300 (AACR2 style)
      expect(parseExtent('xvii, 323 p. :').pages).toBe(323); // bd300 (AACR2 style)
      expect(parseExtent('[8], 233 p.').pages).toBe(233); // AACR2 2.5B3: unnumbered sequences in brackets
      expect(parseExtent('[32] pages').pages).toBe(32); // RDA 3.4.5.3: wholly unnumbered
      expect(parseExtent('1 online resource (xii, 345 pages)').pages).toBe(345);
      expect(parseExtent('1 volume (unpaged) ;').pages).toBeNull();
      expect(parseExtent('3 v.').pages).toBeNull();
    });

    it('reads playing times in minutes', () => {
      expect(parseExtent('1 audio disc (9 hr., 15 min.) :').minutes).toBe(555); // the example
      expect(parseExtent('1 sound disc (20 min.) :').minutes).toBe(20); // bd300
      expect(parseExtent('8 audio discs (ca. 10 hr.)').minutes).toBe(600);
      expect(parseExtent('xii, 345 pages').minutes).toBeNull();
      expect(playingTimeMinutes('002016')).toBe(20); // bd306: hhmmss, 20 min. 16 sec.
      expect(playingTimeMinutes('n/a')).toBeNull();
    });

    it('makes a nonmusical sound recording (leader/06 "i", bdleader) an audiobook in minutes, and an online text (008/23 "o", bd008b) an ebook', () => {
      const audio = book([['300', '  ', 'a', '1 audio disc (9 hr., 15 min.) :']], leader('i'));
      expect([audio.format, audio.audioMinutes, audio.pageCount]).toEqual(['audiobook', 555, null]);
      const fromPlayingTime = book(
        [
          ['300', '  ', 'a', '1 audio disc :'],
          ['306', '  ', 'a', '091500'],
        ],
        leader('i'),
      );
      expect(fromPlayingTime.audioMinutes).toBe(555);
      const ebook = parseMarcXml(
        marcjsXml(BOOK, [
          ['008', field008(2020, 'eng', 'o')],
          ['300', '  ', 'a', '1 online resource (xii, 345 pages)'],
        ]),
      );
      expect([marcToBook(ebook[0]!).format, marcToBook(ebook[0]!).pageCount]).toEqual(['ebook', 345]);
      expect(book([['300', '  ', 'a', '288 pages ;']]).format).toBe('print');
    });
  });

  describe('490 series statement, 800/830 series added entries (bd490, bd800, bd830)', () => {
    it('prefers the controlled 830 form (bd490/bd830: Department of State publication ; 7846)', () => {
      const found = book([
        ['490', '1 ', 'a', 'Department of State publication ;', 'v', '7846'],
        ['830', ' 0', 'a', 'Department of State publication ;', 'v', '7846.'],
      ]);
      expect([found.series, found.seriesPosition]).toEqual(['Department of State publication', 7846]);
    });

    it('reads 800 $t, and 490 alone with "book 2" as position 2', () => {
      const author = book([['800', '1 ', 'a', 'Asquith, Juniper.', 't', 'Saltmarsh quartet ;', 'v', 'bk. 3.']]);
      expect([author.series, author.seriesPosition]).toEqual(['Saltmarsh quartet', 3]);
      const statement = book([['490', '0 ', 'a', 'The saltmarsh quartet ;', 'v', 'book 2']]);
      expect([statement.series, statement.seriesPosition]).toEqual(['The saltmarsh quartet', 2]);
    });
  });

  describe('041 and 008/35-37 language (bd041, bd008a; MARC Code List for Languages), 650 subjects (bd650), 520 summary (bd520)', () => {
    it('takes 041 $a first, else 008/35-37, as a two-letter tag where there is one', () => {
      expect(book([['041', '1 ', 'a', 'eng', 'h', 'fre']]).language).toBe('en'); // bd041: a translation from French
      const french = parseMarcXml(marcjsXml(BOOK, [['008', field008(2020, 'fre')]]))[0]!;
      expect(marcToBook(french).language).toBe('fr');
      const undetermined = parseMarcXml(marcjsXml(BOOK, [['008', field008(2020, 'und')]]))[0]!;
      expect(marcToBook(undetermined).language).toBeNull();
    });

    it('offers 650 $a headings as genres, without subdivisions or the closing period, and 520 $a as the summary', () => {
      const found = book([
        ['520', '  ', 'a', 'A ferry pilot keeps a lantern lit & waits.'],
        ['650', ' 0', 'a', 'Rivers', 'v', 'Fiction.'],
        ['650', ' 0', 'a', 'Moths.'],
      ]);
      expect(found.subjects).toEqual(['Rivers', 'Moths']);
      expect(found.summary).toBe('A ferry pilot keeps a lantern lit & waits.'); // marcjs writes & as &#x26;
    });
  });

  describe('against marcjs (npm) on the whole local catalogue', () => {
    const records = inventedRecords();

    it('reads every record’s leader, fields, indicators and subfields exactly as marcjs reads the same MARCXML', () => {
      expect(records.length).toBeGreaterThan(300);
      for (const local of records) {
        const xml = toMarcXml(local, false);
        const ours = parseMarcXml(xml)[0]!;
        const reference = marcjsRead(xml);
        expect(ours.leader).toBe(reference.leader);
        expect(asMarcjsFields(ours)).toEqual(reference.fields);
      }
    });

    it('maps ISBNs and titles as a reading of marcjs’s fields does (isbn3 for the ISBN-13 forms)', () => {
      for (const local of records) {
        const reference = marcjsRead(toMarcXml(local, false));
        const found = marcToBook(parseMarcXml(toMarcXml(local))[0]!);
        const isbns = reference
          .get('020')
          .flatMap((field) => (field.subf ?? []).filter(([code]) => code === 'a').map(([, value]) => asIsbn13(value.split(' ')[0]!)))
          .filter((isbn): isbn is string => !!isbn);
        const title = reference
          .get('245')[0]!
          .subf!.find(([code]) => code === 'a')![1]
          .replace(/\s*[/:]$/, '')
          .replace(/\.$/, '');
        expect(found.isbns).toEqual([...new Set(isbns)]);
        expect(found.title).toBe(title);
      }
    });
  });
});
