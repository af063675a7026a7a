import type { OutgoingMail } from '../../mail';

const footer = '\n\n— Gridleak, the restoration notebook\nIf you did not ask for this, you can ignore this message.';

export const confirmEmailMail = (to: string, name: string, link: string): OutgoingMail => ({
  to,
  subject: 'Confirm your e-mail for Gridleak',
  text: `Hello ${name},\n\nConfirm this address to finish creating your Gridleak account:\n${link}\n\nThe link works for three days.${footer}`,
});

export const alreadyRegisteredMail = (to: string, signInLink: string, resetLink: string): OutgoingMail => ({
  to,
  subject: 'Your Gridleak account',
  text: `Someone tried to create a Gridleak account with this address, which already has one.\n\nSign in: ${signInLink}\nForgot the password? ${resetLink}${footer}`,
});

export const passwordResetMail = (to: string, link: string): OutgoingMail => ({
  to,
  subject: 'Reset your Gridleak password',
  text: `Choose a new password for your Gridleak account:\n${link}\n\nThe link works once, for one hour. Resetting signs you out everywhere else.${footer}`,
});
