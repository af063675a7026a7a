import nodemailer from 'nodemailer';
import { MailUnavailableError } from '../http/errors';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  probe(): Promise<boolean>;
}

/** E-mail through nodemailer to SMTP_URL (the local capture in development and tests). */
export function createMailer(smtpUrl: string, from: string): Mailer {
  // Bounded waits: invitation and sign-up mail is sent inside the action's transaction (sendOrRollBack below),
  // so a silent mail server must not hold it open for nodemailer's default two minutes.
  const transport = nodemailer.createTransport({
    url: smtpUrl,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    async probe() {
      try {
        await Promise.race([
          transport.verify(),
          new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 3000)),
        ]);
        return true;
      } catch {
        return false;
      }
    },
  };
}

/**
 * Sends a message the action depends on (an invitation or a confirmation link), as the last step inside the
 * action's transaction: if the mail server refuses or cannot be reached, the caller's transaction rolls back
 * and the person is told (503) instead of being left waiting for a message that never comes.
 */
export async function sendOrRollBack(mailer: Mailer, mail: OutgoingMail): Promise<void> {
  try {
    await mailer.send(mail);
  } catch (err) {
    throw Object.assign(new MailUnavailableError(), { cause: err });
  }
}
