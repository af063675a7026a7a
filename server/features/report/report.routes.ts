import { and, eq } from 'drizzle-orm';
import { Router } from 'express';
import { idParamsSchema } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { memberships, users } from '../../db/schema';
import { ConflictError, NotFoundError } from '../../http/errors';
import { guard, requireUser } from '../../http/guard';
import { input, validate } from '../../http/validate';
import { reportData } from './report-data';
import { renderReport } from './report-pdf';

const one = { params: idParamsSchema };
const fileName = (make: string, model: string) => `${`${make}-${model}`.replace(/[^\w]+/g, '-').toLowerCase()}-hand-back-report.pdf`;

/** The hand-back report: the owner's document (only what is shared with them), for every member to download. */
export function reportRoutes(deps: AppDeps): Router {
  const router = Router();
  const build = async (id: number) => {
    const data = await reportData(deps, id);
    if (!data) throw new NotFoundError();
    return { pdf: await renderReport(data), name: fileName(data.set.make, data.set.model), set: data.set };
  };
  router.get('/restorations/:id/report.pdf', requireUser, validate(one), guard(deps.db, 'report.download'), async (_req, res) => {
    const { pdf, name } = await build(input(res, one).params.id);
    res.type('application/pdf').attachment(name).send(pdf);
  });
  router.post('/restorations/:id/report/send', requireUser, validate(one), guard(deps.db, 'report.send'), async (req, res) => {
    const id = input(res, one).params.id;
    const owners = await deps.db
      .select({ email: users.email, name: users.name })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.restorationId, id), eq(memberships.role, 'owner')));
    if (!owners.length) throw new ConflictError('No owner is on this restoration yet: invite them from the People tab first.');
    const { pdf, name, set } = await build(id);
    for (const o of owners)
      await deps.mailer.send({
        to: o.email,
        subject: `Your ${set.make} ${set.model}: the hand-back report`,
        text: `Hello ${o.name},\n\n${req.user!.name} has finished the report on your ${set.make} ${set.model}; it is attached.\nYou can also read its history at ${deps.config.publicOrigin}/restorations/${id}.\n\nPlease read the safety notes at the end before using the set.\n\n— Gridleak, the restoration notebook`,
        attachments: [{ filename: name, content: pdf, contentType: 'application/pdf' }],
      });
    res.json({ sentTo: owners.map((o) => o.email) });
  });
  return router;
}
