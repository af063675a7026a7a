import nodemailer from 'nodemailer';

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
  const transport = nodemailer.createTransport(smtpUrl);
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
