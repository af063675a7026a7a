import { boolean, date, index, integer, pgEnum, pgTable, serial, text } from 'drizzle-orm/pg-core';
import { equipmentKinds, stages, workLevels } from '../../../shared/schemas/restorations';
import { timestamps } from './columns';

export const stageEnum = pgEnum('stage', stages);
export const equipmentKindEnum = pgEnum('equipment_kind', equipmentKinds);
export const workLevelEnum = pgEnum('work_level', workLevels);

/** One set in for work. */
export const restorations = pgTable(
  'restorations',
  {
    id: serial().primaryKey(),
    make: text().notNull(),
    model: text().notNull(),
    year: integer(),
    serial: text(),
    equipmentKind: equipmentKindEnum().notNull().default('radio'),
    /** Voltage setting or taps as found, e.g. "245 V tap" or "AC/DC, dropper clip on the 230–250 V section". */
    mainsSetting: text(),
    /** AC/DC or otherwise live chassis: shows the isolation-transformer caution. */
    liveChassis: boolean().notNull().default(false),
    symptoms: text(),
    conditionNotes: text(),
    workLevel: workLevelEnum().notNull().default('repair'),
    /** The owner asked for hidden replacement parts to look original too. */
    hiddenPartsOriginal: boolean().notNull().default(false),
    story: text(),
    /** For the hand-back report: how to live with the set (ventilation, play time, aerial). */
    careNotes: text(),
    receivedOn: date({ mode: 'string' }),
    stage: stageEnum().notNull().default('intake'),
    /** The owner as recorded at intake; they may never have an account. */
    ownerName: text(),
    ownerEmail: text(),
    ...timestamps,
  },
  (t) => [index('restorations_stage_idx').on(t.stage)],
);
