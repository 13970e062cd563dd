import type {
  Observation,
  Quantity,
  SourceKind,
  Stage,
  TypicalBasis,
} from '@/lib/properties/quantities';

/** A published source as the seed stores it; `note` says how the value was read. */
export interface SeedSource {
  key: string;
  kind: SourceKind;
  authors: string | null;
  year: number | null;
  title: string;
  venue?: string | null;
  pages?: string | null;
  doi?: string | null;
  url?: string | null;
  note: string;
}

/** One value with its unit implied by the quantity, its spread, conditions and source key. */
export interface SeedValue {
  quantity: Quantity;
  variant?: string;
  value: number;
  low?: number;
  high?: number;
  sd?: number;
  samples?: number;
  method?: string;
  ripeness?: string;
  temperature?: string;
  storage?: string;
  loadingRate?: string;
  probe?: string;
  note?: string;
  /** The ripeness stage, where the source stages its values (firm, firm-ripe, ripe). */
  stage?: Stage;
  /**
   * Required for drop_threshold_height and impact_threshold_energy: 'no-bruise' (no bruise at
   * this level: a threshold), 'bruised-at' (fruit bruised at this level: an upper bound, the safe
   * value lies below it), or 'recommended-max' (a handling guide's maximum).
   */
  observation?: Observation;
  isTypicalDefault?: boolean;
  /** Required with isTypicalDefault: 'common practice' (no single source) or 'from memory'. */
  typicalBasis?: TypicalBasis;
  /** A key of SOURCES; null only for a clearly labelled typical default. */
  source: string | null;
}

export interface SeedCultivar {
  slug: string;
  name: string;
  /**
   * The commodity's own record (slug `<commodity>-type`): values for the commodity in general,
   * which every cultivar of it inherits where it has none of its own. One per commodity.
   */
  isType?: boolean;
  values: SeedValue[];
}

export interface SeedCommodity {
  slug: string;
  name: string;
  family: string;
  botanicalName?: string;
  cultivars: SeedCultivar[];
}
