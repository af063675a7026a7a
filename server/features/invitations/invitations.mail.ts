import { roleLabels, type Role } from '../../../shared/permissions';
import type { OutgoingMail } from '../../mail';

const what: Record<Role, string> = {
  technician: 'work on it with full access to its notebook',
  mentor: 'advise on it: see its photos, findings and readings, and comment on the exact spots',
  owner: 'follow its restoration: the photos, findings and notes shared with you, and the hand-back report',
};

export function invitationMail(p: {
  to: string;
  inviter: string;
  set: string;
  role: Role;
  link: string;
}): OutgoingMail {
  return {
    to: p.to,
    subject: `${p.inviter} invited you to the ${p.set} on Gridleak`,
    text:
      `${p.inviter} invited you to the ${p.set} as ${roleLabels[p.role].toLowerCase()}, to ${what[p.role]}.\n\n` +
      `Open the invitation:\n${p.link}\n\nThe link works once and expires in seven days.\n\n— Gridleak, the restoration notebook`,
  };
}
