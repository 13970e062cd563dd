import type {
  Observation,
  Quantity,
  RevisionStatus,
  SourceKind,
  Stage,
  TypicalBasis,
} from './quantities';

// The shapes lib/data reads from the database and every layer shows. Declared here, below
// lib/data, so lib/validation, lib/lab-tests and lib/properties use them without importing it.

/** A source as every page and route shows it. */
export interface SourceRef {
  id: number;
  key: string;
  kind: SourceKind;
  authors: string | null;
  year: number | null;
  title: string;
  venue: string | null;
  pages: string | null;
  doi: string | null;
  url: string | null;
  note: string | null;
}

export interface RevisionValue {
  id: number;
  quantity: Quantity;
  variant: string;
  value: number;
  unit: string;
  low: number | null;
  high: number | null;
  sd: number | null;
  samples: number | null;
  method: string | null;
  ripeness: string | null;
  temperature: string | null;
  storage: string | null;
  loadingRate: string | null;
  probe: string | null;
  note: string | null;
  isTypicalDefault: boolean;
  /** The ripeness stage the value was measured at, where the source stages its values. */
  stage: Stage | null;
  /** For drop and impact figures: what was observed at this level. */
  observation: Observation | null;
  /** For a typical value: common practice, or recalled from memory. */
  typicalBasis: TypicalBasis | null;
  source: SourceRef | null;
}

export interface RevisionSummary {
  id: number;
  cultivarId: number;
  number: number;
  status: RevisionStatus;
  authorId: number;
  authorName: string;
  reviewerName: string | null;
  reviewComment: string | null;
  basedOnId: number | null;
  summary: string | null;
  isDemo: boolean;
  createdAt: string;
  submittedAt: string | null;
  reviewedAt: string | null;
  publishedAt: string | null;
  supersededAt: string | null;
}

export interface CommodityRef {
  id: number;
  slug: string;
  name: string;
  family: string;
}

export interface CultivarRecord {
  id: number;
  slug: string;
  name: string;
  isType: boolean;
  commodity: CommodityRef;
  published: RevisionSummary | null;
  /** The published values (empty when nothing is published yet). */
  values: RevisionValue[];
}
