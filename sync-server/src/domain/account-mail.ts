import type { OutgoingMail } from '../mail/mailer';

/** The minutes a reset link stays valid. */
export const RESET_LINK_MINUTES = 30;

const PRIVACY_LINE =
  'Your journal is private to you unless you choose to share it. We only e-mail you about your account, and never share your address.';

export function welcomeMail(to: string, displayName: string, publicUrl: string): OutgoingMail {
  return {
    to,
    subject: 'Welcome to Lamplight',
    text: [
      `Hello ${displayName},`,
      '',
      'Your Lamplight journal is ready. Add it to your home screen and it works with no signal;',
      'what you write is kept on your device and reconciled with your other devices when you are back online.',
      '',
      `Open it: ${publicUrl}/`,
      '',
      PRIVACY_LINE,
    ].join('\n'),
  };
}

export function passwordResetMail(to: string, displayName: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Choose a new Lamplight password',
    text: [
      `Hello ${displayName},`,
      '',
      `Someone asked to reset the password of this Lamplight account. If it was you, open this link within ${RESET_LINK_MINUTES} minutes:`,
      '',
      link,
      '',
      'The link works once. If you did not ask, ignore this message: your password stays as it is.',
      '',
      PRIVACY_LINE,
    ].join('\n'),
  };
}
