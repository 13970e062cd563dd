import { FemInputError } from '../errors';
import { BODY_MODELS, MESH_LEVELS, type UnitBodyKey } from '../types';
import { requireFinite, requireOneOf, requirePoisson } from '../validate';
import { buildCondensedBody, type FemBody } from './build';
import { requireBands } from './grading';

export type { FemBody } from './build';

/** Smallest allowed axial/equatorial radius ratio of the unit body. */
export const ASPECT_MIN = 0.3;
/** Largest allowed axial/equatorial radius ratio of the unit body. */
export const ASPECT_MAX = 3;

/** Bodies kept at most, least recently used dropped first. */
export const CACHE_LIMIT = 32;
/**
 * Memory the cached bodies may hold, bytes (see FemBody.bytes; a graded normal body holds
 * 2–10 MB, a fine one 10–40 MB): past it the least recently used are dropped, the newest kept.
 */
export const CACHE_BYTES = 384 * 2 ** 20;
const cache = new Map<string, FemBody>();
let cachedBytes = 0;

/**
 * The unit body (equatorial radius 1 m, E = 1 Pa) condensed onto the axial DOFs of its candidate
 * contact nodes (surface nodes from the pole out to r = 0.6), built once per
 * (model, aspect, poisson, level, contact band, edge band) and cached in memory (up to
 * CACHE_LIMIT bodies and CACHE_BYTES, LRU).
 * Scale per the CondensedBody contract: axisymmetric K_real = E·R·K, plane strain K_real = E·K
 * per metre of thickness (half slice, see FemBody.forceFactor). Throws FemInputError naming the
 * field for an invalid key. The returned object is shared: do not mutate its arrays or K.
 */
export function getCondensedBody(key: UnitBodyKey): FemBody {
  const valid = validateKey(key);
  const edge = valid.edgeBand;
  const id = [
    valid.model,
    valid.aspect,
    valid.poisson,
    valid.level,
    valid.contactBand ?? '',
    edge ? `${edge.spacing}:${edge.lo}:${edge.hi}` : '',
  ].join('|');
  const hit = cache.get(id);
  if (hit) {
    cache.delete(id);
    cache.set(id, hit);
    return hit;
  }
  const body = buildCondensedBody(valid);
  cache.set(id, body);
  cachedBytes += body.bytes;
  while (cache.size > 1 && (cache.size > CACHE_LIMIT || cachedBytes > CACHE_BYTES)) {
    const oldest = cache.keys().next().value as string;
    cachedBytes -= (cache.get(oldest) as FemBody).bytes;
    cache.delete(oldest);
  }
  return body;
}

/** Empties the in-memory cache of condensed bodies (tests, memory pressure). */
export function clearCondensedBodyCache(): void {
  cache.clear();
  cachedBytes = 0;
}

function validateKey(key: UnitBodyKey): UnitBodyKey {
  requireOneOf('model', key.model, BODY_MODELS);
  requireOneOf('level', key.level, MESH_LEVELS);
  requireFinite('aspect', key.aspect);
  if (key.aspect < ASPECT_MIN || key.aspect > ASPECT_MAX) {
    throw new FemInputError('aspect', `aspect must lie between ${ASPECT_MIN} and ${ASPECT_MAX}`);
  }
  requirePoisson('poisson', key.poisson);
  requireBands(key.contactBand, key.edgeBand);
  const valid: UnitBodyKey = {
    model: key.model,
    aspect: key.aspect,
    poisson: key.poisson,
    level: key.level,
  };
  if (key.contactBand !== undefined) valid.contactBand = key.contactBand;
  if (key.edgeBand !== undefined) valid.edgeBand = { ...key.edgeBand };
  return valid;
}
