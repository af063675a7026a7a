import type { AppDeps } from '../../app-deps';
import type { Executor } from '../../db/client';
import { sendOrRollBack } from '../../mail';
import { documentMoney } from '../workshop/document-format';
import { readWorkshopSettings } from '../workshop/workshop-settings';
import { invoiceDocument } from './invoice-document';
import { documentTitle, renderInvoice } from './invoice-pdf';

const fileName = (title: string) => `${title.replace(/[^\w]+/g, '-').toLowerCase()}.pdf`;

/**
 * E-mails a just-issued invoice, deposit request or credit note to every owner of the set, with its PDF, as the
 * last step of the issuing transaction: if the mail server refuses, nothing is issued and the number is not
 * used (503). A set with no owner on Gridleak yet gets no mail; the PDF can be handed over instead.
 */
export async function mailInvoice(tx: Executor, deps: Pick<AppDeps, 'mailer' | 'config'>, invoiceId: number) {
  const d = (await invoiceDocument(tx, invoiceId))!;
  if (!d.owners.length) return;
  const { timeZone } = await readWorkshopSettings(tx);
  const title = documentTitle(d, 'invoice');
  const pdf = await renderInvoice(d, 'invoice', timeZone);
  const i = d.invoice;
  const what =
    i.kind === 'credit-note'
      ? `credits ${documentMoney(-i.due, i.currency)}${d.credits ? ` against invoice ${d.credits}` : ''}`
      : `is for ${documentMoney(i.due, i.currency)}${i.deducted ? ` after ${documentMoney(i.deducted, i.currency)} of deposits paid` : ''}`;
  for (const o of d.owners)
    await sendOrRollBack(deps.mailer, {
      to: o.email,
      subject: `Your ${d.set.make} ${d.set.model}: ${title}`,
      text: `Hello ${o.name},\n\nThe workshop has issued ${title} for your ${d.set.make} ${d.set.model}. It ${what}.\nThe PDF is attached; you can also read it on your page at ${deps.config.publicOrigin}/restorations/${i.restorationId}/money.\n\n— Gridleak, the restoration notebook`,
      attachments: [{ filename: fileName(title), content: pdf, contentType: 'application/pdf' }],
    });
}
