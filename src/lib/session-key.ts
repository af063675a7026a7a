/** The query key of the signed-in person; the query client clears it on any 401. */
export const ME_KEY = ['auth', 'me'] as const;
