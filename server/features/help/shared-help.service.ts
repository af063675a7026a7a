import type { HelpReplyInput, SharedHelp } from '../../../shared/schemas/help';
import type { AppDeps } from '../../app-deps';
import { NotFoundError } from '../../http/errors';
import { takePoints, throttleCounter } from '../auth/throttle';
import { hashToken } from '../auth/tokens';
import { helpContent } from './help-content';
import { helpRepo } from './help.repo';

/** Replies allowed through links per IP, and per link, in an hour (shared by every instance, table `throttles`). */
export const helpReplyLimits = { perIp: 20, perLink: 30, windowSeconds: 3600 };

/**
 * What a link's holder may do without an account: read the request as an owner would see it, and leave a
 * reply that waits for a technician. Unknown, expired and revoked links are all the same 404.
 */
export function sharedHelpService(deps: Pick<AppDeps, 'db' | 'pool' | 'storage' | 'logger' | 'config'>) {
  const repo = helpRepo(deps.db);
  const limiter = (keyPrefix: string, points: number) =>
    throttleCounter(deps.pool, keyPrefix, points, helpReplyLimits.windowSeconds);
  const perIp = limiter('help-reply-ip', helpReplyLimits.perIp);
  const perLink = limiter('help-reply-link', helpReplyLimits.perLink);

  const live = async (token: string) => {
    const found = await repo.liveLink(hashToken(token));
    if (!found) throw new NotFoundError('This link has expired, was withdrawn, or never existed.');
    return found;
  };

  return {
    async read(token: string): Promise<SharedHelp> {
      const { link, request } = await live(token);
      return { ...(await helpContent(deps, request, 'owner', 'approved')), expiresAt: link.expiresAt.toISOString() };
    },
    async reply(token: string, input: HelpReplyInput, ip: string) {
      const { link, request } = await live(token);
      await takePoints(
        [
          [perIp, ip],
          [perLink, String(link.id)],
        ],
        'Too many replies from here; wait an hour and try again.',
      );
      const row = await repo.insertReply({
        helpRequestId: request.id,
        linkId: link.id,
        name: input.name,
        body: input.body,
      });
      return { id: row.id, held: true as const };
    },
  };
}
