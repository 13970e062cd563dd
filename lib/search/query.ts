import { z } from 'zod';
import { MAX_QUERY_LENGTH } from './types';

/** `GET /api/search?q=`: a missing q is an empty search; over 100 characters is refused. */
export const searchQuerySchema = z.object({
  q: z
    .string()
    .max(MAX_QUERY_LENGTH, `Search for at most ${MAX_QUERY_LENGTH} characters.`)
    .transform((q) => q.trim()),
});
