import type { OutgoingMail } from '../mailer';
import { renderMail } from '../layout';

/** The message with a link to choose a new password; the link works once, for one hour. */
export function passwordResetMail(to: string, name: string, url: string): OutgoingMail {
  const subject = 'Set a new Seamwright password';
  return {
    to,
    subject,
    ...renderMail({
      subject,
      paragraphs: [
        `Hello ${name},`,
        'someone asked to set a new password for this Seamwright account. The link below works once, within one hour. Setting a new password signs you out on every device.',
      ],
      action: { label: 'Choose a new password', url },
      closing: 'If you did not ask for this, ignore this message: your password stays as it is.',
    }),
  };
}
