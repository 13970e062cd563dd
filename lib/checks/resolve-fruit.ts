import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { pinCultivar } from './cultivar-inputs';
import { NO_EVIDENCE, fruitFromEvidence, type FruitEntry, type ResolvedFruit } from './fruit';

export {
  EQUATORIAL,
  fruitFromEvidence,
  fruitUsed,
  missing,
  required,
  type FruitEntry,
  type ResolvedFruit,
} from './fruit';

/** The fruit's properties for a check, each from the first rung of the evidence ladder. */
export async function resolveFruit(actor: Actor, entry: FruitEntry): Promise<ResolvedFruit> {
  const pinned = entry.cultivar
    ? await pinCultivar(actor, entry.cultivar, entry.stage ?? null)
    : null;
  return fruitFromEvidence(pinned, pinned?.evidence ?? NO_EVIDENCE, entry);
}
