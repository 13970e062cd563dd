import { z } from 'zod';

export const MAX_QUERY_LENGTH = 100;

/** `GET /api/search?q=`: a missing q is an empty search; over 100 characters is refused. */
export const searchQuerySchema = z.object({
  q: z
    .string()
    .max(MAX_QUERY_LENGTH, `Search for at most ${MAX_QUERY_LENGTH} characters.`)
    .transform((q) => q.trim()),
});
