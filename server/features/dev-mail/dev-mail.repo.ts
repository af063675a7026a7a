import { desc } from 'drizzle-orm';
import type { CapturedMail } from '../../../shared/schemas/dev-mail';
import type { Executor } from '../../db/client';
import { devMails } from '../../db/schema';

/** Captured mail as the API shows it. */
export function devMailRepo(db: Executor) {
  return {
    /** The newest `limit` messages first. */
    async newest(limit: number): Promise<CapturedMail[]> {
      const rows = await db.select().from(devMails).orderBy(desc(devMails.id)).limit(limit);
      return rows.map((m) => ({
        to: m.to,
        from: m.from,
        subject: m.subject,
        text: m.text,
        html: m.html,
        date: m.receivedAt.toISOString(),
      }));
    },
  };
}
