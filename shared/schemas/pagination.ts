import { z } from 'zod';

/** Lists come in pages: `?limit=` (default 100, at most 500) and `?cursor=` from the previous page. */
export const PAGE_DEFAULT = 100;
export const PAGE_MAX = 500;
/** The next page's cursor travels in this header (and a `Link: <…>; rel="next"`); the body stays the plain array. */
export const NEXT_CURSOR_HEADER = 'X-Next-Cursor';

export const pageQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(PAGE_MAX).default(PAGE_DEFAULT),
  cursor: z.string().max(400).optional(),
});
