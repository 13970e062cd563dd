import type { Quantity, SourceKind } from '@/lib/properties/quantities';

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
  isTypicalDefault?: boolean;
  /** A key of SOURCES; null only for a clearly labelled typical default. */
  source: string | null;
}

export interface SeedCultivar {
  slug: string;
  name: string;
  /** The commodity in general, where the source named no cultivar. */
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
