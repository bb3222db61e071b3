import type { OutgoingMail } from '../mail/mailer';
import { INVITATION_DAYS } from '../../../shared/circles/invitations';

/**
 * An invitation. The address may belong to anyone, so the mail carries no words the host chose
 * (not the circle's name, not theirs): the reader sees who invited them after opening the link.
 */
export function invitationMail(to: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'You are invited to a Lamplight reading circle',
    text: [
      'Hello,',
      '',
      'A Lamplight reader invited you to read with their circle: a book at a time, with a schedule and a place to talk about each part.',
      `Open this link within ${INVITATION_DAYS} days to see the circle and join it (you can sign in or create an account first):`,
      '',
      link,
      '',
      'The link works once. If you were not expecting it, ignore this message: nothing more is sent to this address.',
      '',
      'A circle sees what you post there, your display name and your answers to meetings; your own journal stays private.',
    ].join('\n'),
  };
}

/** The day-before reminder of a meeting, to a member who did not say "not going". Members chose to receive circle mail by joining. */
export function meetingReminderMail(
  to: string,
  meeting: { circleName: string; partLabel: string; day: string; time: string | null; place: string | null; link: string | null },
  appLink: string,
): OutgoingMail {
  return {
    to,
    subject: `Tomorrow: ${meeting.circleName} meets`,
    text: [
      'Hello,',
      '',
      `${meeting.circleName} meets tomorrow, ${meeting.day}${meeting.time ? ` at ${meeting.time}` : ''}, about ${meeting.partLabel}.`,
      ...(meeting.place ? [`Where: ${meeting.place}`] : []),
      ...(meeting.link ? [`Link: ${meeting.link}`] : []),
      '',
      `The circle and its discussion: ${appLink}`,
      '',
      'You get this because you are a member of this circle and did not answer "not going". Leave the circle to stop these mails.',
    ].join('\n'),
  };
}
