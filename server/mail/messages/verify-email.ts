import type { OutgoingMail } from '../mailer';
import { renderMail } from '../layout';

/** The message that confirms a new account's address. */
export function verifyEmailMail(to: string, name: string, url: string): OutgoingMail {
  const subject = 'Confirm your e-mail address for Seamwright';
  return {
    to,
    subject,
    ...renderMail({
      subject,
      paragraphs: [
        `Hello ${name},`,
        'please confirm that this is your address. Once it is confirmed you can invite people to your teams and join teams you are invited to.',
      ],
      action: { label: 'Confirm my address', url },
      closing: 'If you did not create a Seamwright account, you can ignore this message.',
    }),
  };
}
