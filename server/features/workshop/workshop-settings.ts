import { eq } from 'drizzle-orm';
import { workshopSettingsSchema, type WorkshopSettings } from '../../../shared/schemas/estimates';
import type { TaxRule } from '../../../shared/money/tax';
import type { Executor } from '../../db/client';
import { workshopSettings } from '../../db/schema';

const settingsFields = Object.keys(workshopSettingsSchema.shape) as (keyof WorkshopSettings)[];

/** The workshop's money settings; the row is created with its defaults the first time it is read. */
export async function readWorkshopSettings(db: Executor): Promise<WorkshopSettings> {
  await db.insert(workshopSettings).values({ id: 1 }).onConflictDoNothing();
  const [row] = await db.select().from(workshopSettings).where(eq(workshopSettings.id, 1));
  // The API's fields, as the schema names them; the row's id and timestamps stay here.
  return Object.fromEntries(settingsFields.map((k) => [k, row![k]])) as WorkshopSettings;
}

/** The settings a caller may leave out keep what is stored (or the defaults). */
export type WorkshopSettingsWrite = Omit<WorkshopSettings, 'invoicePrefix' | 'timeZone'> &
  Partial<Pick<WorkshopSettings, 'invoicePrefix' | 'timeZone'>>;

export async function writeWorkshopSettings(db: Executor, values: WorkshopSettingsWrite): Promise<WorkshopSettings> {
  await db
    .insert(workshopSettings)
    .values({ id: 1, ...values })
    .onConflictDoUpdate({ target: workshopSettings.id, set: values });
  return readWorkshopSettings(db);
}

/** The tax a set of prices carries, or null when none is charged. */
export function taxRuleOf(s: Pick<WorkshopSettings, 'taxName' | 'taxRateBasisPoints' | 'taxRounding'>): TaxRule | null {
  return s.taxRateBasisPoints === null
    ? null
    : { name: s.taxName, rateBasisPoints: s.taxRateBasisPoints, rounding: s.taxRounding };
}
