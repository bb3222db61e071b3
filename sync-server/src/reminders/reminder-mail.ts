import type { ReminderItem } from '../../../shared/loans/reminders';
import type { OutgoingMail } from '../mail/mailer';

/** A reminder line: a title and a date, nothing else of the reader's. */
export interface ReminderLine extends ReminderItem {
  readonly title: string | null;
}

/** '5 March 2026' (en-GB), 'March 5, 2026' (en-US): the day as the reader's date locale writes it; en-GB for one Node does not know. */
function dayText(day: string, locale: string): string {
  const instant = new Date(`${day}T00:00:00Z`);
  const options: Intl.DateTimeFormatOptions = { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' };
  try {
    return new Intl.DateTimeFormat(locale, options).format(instant);
  } catch {
    return new Intl.DateTimeFormat('en-GB', options).format(instant);
  }
}

function sentence(line: ReminderLine, locale: string): string {
  const title = `“${line.title ?? 'A book'}”`;
  const date = line.date ? dayText(line.date, locale) : null;
  if (line.kind === 'holdReady') return `${title} is ready to pick up${date ? ` (by ${date})` : ''}.`;
  if (line.kind === 'lentOverdue') return `${title} was expected back${date ? ` on ${date}` : ''}.`;
  return `${title} is due back${date ? ` on ${date}` : ''}.`;
}

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * A reminder (one item, or the day's digest) in plain text and HTML with the same words, its
 * dates in the reader's date locale (Settings › Dates and look; en-GB when none). Only
 * titles and dates: no library, card, friend or note. The unsubscribe link works without
 * signing in, and List-Unsubscribe (RFC 2369) with List-Unsubscribe-Post (RFC 8058) lets mail
 * apps offer it in one click.
 */
export function reminderMail(to: string, lines: readonly ReminderLine[], unsubscribeUrl: string, appUrl: string, locale = 'en-GB'): OutgoingMail {
  const sentences = lines.map((line) => sentence(line, locale));
  const subject = lines.length === 1 ? `Lamplight: ${sentences[0]!.replace(/\.$/, '')}` : `Lamplight: ${lines.length} loan reminders`;
  const text = [
    'Hello,',
    '',
    ...sentences.map((s) => `- ${s}`),
    '',
    `Your loans: ${appUrl}/loans`,
    '',
    'You asked Lamplight for these reminders. To stop them, open this link (no sign-in needed):',
    unsubscribeUrl,
  ].join('\n');
  const html = [
    '<!doctype html><html lang="en"><body>',
    '<p>Hello,</p>',
    `<ul>${sentences.map((s) => `<li>${escapeHtml(s)}</li>`).join('')}</ul>`,
    `<p><a href="${escapeHtml(appUrl)}/loans">Your loans</a></p>`,
    `<p>You asked Lamplight for these reminders. <a href="${escapeHtml(unsubscribeUrl)}">Stop these reminders</a> (no sign-in needed).</p>`,
    '</body></html>',
  ].join('');
  return {
    to,
    subject,
    text,
    html,
    headers: { 'List-Unsubscribe': `<${unsubscribeUrl}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
  };
}
