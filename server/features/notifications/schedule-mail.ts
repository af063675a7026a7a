import type { AppDeps } from '../../app-deps';
import { flushNotificationMail } from './mail-batch';

/** Every instance flushes every 30 s; the row locks make sure each item is mailed once. */
export function scheduleNotificationMail(deps: Pick<AppDeps, 'db' | 'mailer' | 'config' | 'logger'>): void {
  setInterval(() => {
    flushNotificationMail(deps).catch((err: Error) => deps.logger.warn(`notification mail: ${err.message}`));
  }, 30_000).unref();
}
