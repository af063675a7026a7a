import { z } from 'zod';

/** Ids are PostgreSQL `serial` (int4) columns: 1 … 2,147,483,647. */
export const ID_MAX = 2_147_483_647;

/** An id from a path or query string: anything else is a 400, never a database error. */
export const idSchema = z.coerce
  .number()
  .int('must be a positive whole number')
  .positive('must be a positive whole number')
  .max(ID_MAX, 'is not an id Gridleak uses');

/** An id inside a JSON body. */
export const bodyIdSchema = z.number().int().positive().max(ID_MAX, 'is not an id Gridleak uses');
