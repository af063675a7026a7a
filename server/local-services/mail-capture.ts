import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Database } from '../db/client';
import { devMails } from '../db/schema';

export interface MailCapture {
  url: string;
  close(): Promise<void>;
}

/** A local SMTP server that stores every message in the dev_mails table instead of delivering it. */
export async function startMailCapture(db: Database, port: number): Promise<MailCapture> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Gridleak mail capture',
    logger: false,
    async onData(stream, _session, callback) {
      try {
        const mail = await simpleParser(stream);
        await db.insert(devMails).values({
          to: addresses(mail.to),
          from: addresses(mail.from),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          html: typeof mail.html === 'string' ? mail.html : null,
        });
        callback();
      } catch (err) {
        callback(err as Error);
      }
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  const boundPort = typeof address === 'object' && address ? address.port : port;
  return {
    url: `smtp://127.0.0.1:${boundPort}`,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

function addresses(field: AddressObject | AddressObject[] | undefined): string {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list
    .flatMap((a) => a.value.map((v) => v.address ?? ''))
    .filter(Boolean)
    .join(', ');
}
