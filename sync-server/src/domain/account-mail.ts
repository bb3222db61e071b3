import type { OutgoingMail } from '../mail/mailer';

/** The minutes a reset link stays valid. */
export const RESET_LINK_MINUTES = 30;

const PRIVACY_LINE = 'Your journal is private to you unless you choose to share it. We only e-mail you about your account, and never share your address.';

const NOT_YOU = 'If you did not create a Lamplight account, ignore this message: without the link, nothing more is sent to this address.';

/**
 * The welcome note. Anyone can register any address, so it carries no text the registering
 * person chose (not even the display name): only our words and the link to confirm the address.
 */
export function welcomeMail(to: string, verifyLink: string, publicUrl: string): OutgoingMail {
  return {
    to,
    subject: 'Welcome to Lamplight',
    text: [
      'Hello,',
      '',
      'Your Lamplight journal is ready. Add it to your home screen and it works with no signal;',
      'what you write is kept on your device and reconciled with your other devices when you are back online.',
      '',
      'Please confirm that this address is yours:',
      '',
      verifyLink,
      '',
      `Open your journal: ${publicUrl}/`,
      '',
      NOT_YOU,
      '',
      PRIVACY_LINE,
    ].join('\n'),
  };
}

/** A fresh confirmation link, asked for from the account page. No user-chosen text either. */
export function verificationMail(to: string, verifyLink: string): OutgoingMail {
  return {
    to,
    subject: 'Confirm your e-mail address for Lamplight',
    text: ['Hello,', '', 'Please confirm that this address is yours:', '', verifyLink, '', NOT_YOU, '', PRIVACY_LINE].join('\n'),
  };
}

/** Greets by name only when `displayName` is given, which callers do once the address is verified. */
export function passwordResetMail(to: string, displayName: string | null, link: string): OutgoingMail {
  return {
    to,
    subject: 'Choose a new Lamplight password',
    text: [
      displayName === null ? 'Hello,' : `Hello ${displayName},`,
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
