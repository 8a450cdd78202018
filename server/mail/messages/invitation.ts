import type { OutgoingMail } from '../mailer';
import { renderMail } from '../layout';

export interface InvitationMailInput {
  to: string;
  inviterName: string;
  teamName: string;
  role: string;
  url: string;
}

const roleWords: Record<string, string> = {
  owner: 'an owner (everything, including members)',
  editor: 'an editor (create and change presets and profiles)',
  viewer: 'a viewer (see everything, download kits)',
};

/** The invitation into a team; the link works once, for seven days, for this address only. */
export function invitationMail({ to, inviterName, teamName, role, url }: InvitationMailInput): OutgoingMail {
  const subject = `${inviterName} invited you to ${teamName} on Seamwright`;
  return {
    to,
    subject,
    ...renderMail({
      subject,
      paragraphs: [
        'Hello,',
        `${inviterName} invited you to join the team "${teamName}" on Seamwright as ${roleWords[role] ?? role}.`,
        `Accept with an account for ${to}: sign in, or create one with this address. The link works once, within seven days.`,
      ],
      action: { label: 'Open the invitation', url },
      closing: 'If you were not expecting this, you can ignore this message.',
    }),
  };
}
