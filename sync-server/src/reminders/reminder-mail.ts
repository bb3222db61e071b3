import { MONTH_NAMES } from '../../../shared/calendar/month-names';
import type { ReminderItem } from '../../../shared/loans/reminders';
import type { OutgoingMail } from '../mail/mailer';

/** A reminder line: a title and a date, nothing else of the reader's. */
export interface ReminderLine extends ReminderItem {
  readonly title: string | null;
}

const dayText = (day: string) => `${Number(day.slice(8, 10))} ${MONTH_NAMES[Number(day.slice(5, 7)) - 1]} ${day.slice(0, 4)}`;

function sentence(line: ReminderLine): string {
  const title = `“${line.title ?? 'A book'}”`;
  const date = line.date ? dayText(line.date) : null;
  if (line.kind === 'holdReady') return `${title} is ready to pick up${date ? ` (by ${date})` : ''}.`;
  if (line.kind === 'lentOverdue') return `${title} was expected back${date ? ` on ${date}` : ''}.`;
  return `${title} is due back${date ? ` on ${date}` : ''}.`;
}

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * A reminder (one item, or the day's digest) in plain text and HTML with the same words. Only
 * titles and dates: no library, card, friend or note. The unsubscribe link works without
 * signing in, and List-Unsubscribe (RFC 2369) with List-Unsubscribe-Post (RFC 8058) lets mail
 * apps offer it in one click.
 */
export function reminderMail(to: string, lines: readonly ReminderLine[], unsubscribeUrl: string, appUrl: string): OutgoingMail {
  const sentences = lines.map(sentence);
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
