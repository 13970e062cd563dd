import { z } from 'zod';
import { idSchema } from './id';

/** The author's decision on one conflict of a rebased draft. */
export const resolveConflictSchema = z.object({
  conflictId: z.preprocess((v) => (typeof v === 'number' ? String(v) : v), idSchema),
  choice: z.enum(['mine', 'theirs'], { error: 'Choose to keep yours or take the published one.' }),
});
