import type { LoanView } from './loan-view';

/**
 * A one-off .ics file with a loan's due (or pick-up-by) day, made on the device, so it works
 * offline. ical-generator (loaded on first use) writes RFC 5545: an all-day VALUE=DATE event
 * with DTEND the next day (§3.6.1). Only the title and the date go in.
 */
export async function loanIcs(view: LoanView): Promise<string | null> {
  const day = view.loan.kind === 'hold' ? view.loan.pickUpBy : view.loan.dueOn;
  if (!day) return null;
  const { default: ical } = await import('ical-generator');
  const calendar = ical({ prodId: { company: 'Lamplight', product: 'Reading journal', language: 'EN' } });
  const start = new Date(`${day}T00:00:00Z`);
  calendar.createEvent({
    id: `loan-${view.loan.id}@lamplight`,
    allDay: true,
    start,
    end: new Date(start.getTime() + 86_400_000),
    summary: `${view.loan.kind === 'hold' ? 'Last day to pick up' : 'Due back'}: ${view.title}`,
  });
  return `${calendar.toString()}\r\n`;
}

/** Saves the file through the browser (a download link; no network). */
export async function downloadLoanIcs(view: LoanView): Promise<void> {
  const text = await loanIcs(view);
  if (text === null) return;
  const url = URL.createObjectURL(new Blob([text], { type: 'text/calendar' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = 'lamplight-due-date.ics';
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
