import ICAL from 'ical.js';

import type { Library, Loan } from '@shared/sync/schema/collections';

import { loanIcs } from './loan-ics';
import { loanView } from './loan-view';

const BOOK = { id: '00000000-0000-4000-8000-00000000d001', title: 'Salt, Rope; and the Tide', format: 'print' as const };
const LIBRARY: Library = { id: '00000000-0000-4000-8000-00000000d002', name: 'Fernwick Reading Rooms', cardNumber: '29876543210' };

const view = (loan: Partial<Loan>) =>
  loanView(
    { id: '00000000-0000-4000-8000-00000000d003', kind: 'library', bookId: BOOK.id, libraryId: LIBRARY.id, ...loan },
    '2026-03-01',
    new Map([[BOOK.id, BOOK]]),
    new Map([[LIBRARY.id, LIBRARY]]),
  );

/** The one-off file, made on the device with no network, read by ical.js (a parser from npm) against RFC 5545. */
describe('loanIcs', () => {
  it('writes one all-day event on the due day: VALUE=DATE (§3.3.4), DTEND the next day (§3.6.1), CRLF lines (§3.1)', async () => {
    const text = (await loanIcs(view({ dueOn: '2026-03-31' })))!;
    expect(text).toMatch(/^BEGIN:VCALENDAR\r\n/);
    expect(text.replace(/\r\n/g, '')).not.toContain('\n');
    expect(text).toContain('DTSTART;VALUE=DATE:20260331');
    const [event] = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents('vevent');
    expect((event!.getFirstPropertyValue('dtstart') as ICAL.Time).isDate).toBeTrue();
    expect((event!.getFirstPropertyValue('dtend') as ICAL.Time).toString()).toBe('2026-04-01');
    // §3.3.11: the comma and semicolon of the title come back unescaped from the parser.
    expect(event!.getFirstPropertyValue('summary')).toBe(`Due back: ${BOOK.title}`);
    // The same UID as the feed's event for this loan, so a calendar does not show it twice.
    expect(event!.getFirstPropertyValue('uid')).toBe('loan-00000000-0000-4000-8000-00000000d003@lamplight');
  });

  it("uses a hold's pick-up day, and names neither the library nor the card", async () => {
    const text = (await loanIcs(view({ kind: 'hold', readyOn: '2026-03-01', pickUpBy: '2026-03-04' })))!;
    const [event] = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents('vevent');
    expect((event!.getFirstPropertyValue('dtstart') as ICAL.Time).toString()).toBe('2026-03-04');
    expect(event!.getFirstPropertyValue('summary')).toBe(`Last day to pick up: ${BOOK.title}`);
    expect(text).not.toContain('Fernwick');
    expect(text).not.toContain(LIBRARY.cardNumber!);
  });

  it('makes nothing for a loan with no day to put in a calendar', async () => {
    expect(await loanIcs(view({ dueOn: null }))).toBeNull();
  });
});
