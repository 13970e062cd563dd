import type { Generated } from 'kysely';

/**
 * The tables of migrations/*.ts as the drivers return their rows, for typed (Kysely) reads on
 * the one Knex connection (lib/db-kysely.ts). Where better-sqlite3 and pg differ the type is the
 * union, and lib/db-values.ts turns it into one JavaScript value. Enumerated text columns (role,
 * status, kind, check…) stay `string`: the database does not hold them to their lists, so the
 * readers narrow them. Keep in step with the migrations; tests/db/typed-rows.test.ts compares
 * these reads with plain Knex reads.
 */

/**
 * SQLite keeps what knex wrote: epoch milliseconds for a JavaScript Date, or the
 * 'YYYY-MM-DD HH:MM:SS' text of a CURRENT_TIMESTAMP default. PostgreSQL (timestamptz): a Date.
 */
export type Timestamp = Date | number | string;

/** SQLite has no boolean type: 0 or 1. PostgreSQL: a boolean. */
export type Bool = boolean | 0 | 1;

/** A bigint: a number from SQLite, a string from pg (which does not round 64-bit integers). */
export type BigIntColumn = number | string;

/** JSON documents are stored as text on both databases; lib/db-json.ts parses them. */
export type JsonText = string;

export interface UsersTable {
  id: Generated<number>;
  email: string;
  name: string;
  password_hash: string;
  role: string;
  disabled: Generated<Bool>;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
  unit_system: Generated<string>;
  /** migrations/20261206000200: e-mails of the revision workflow (on unless muted). */
  workflow_mail: Generated<Bool>;
}

export interface SignInLimitsTable {
  key: string;
  points: Generated<number>;
  expire: BigIntColumn | null;
}

export interface InvitationsTable {
  id: Generated<number>;
  email: string;
  role: string;
  token_hash: string;
  invited_by: number;
  expires_at: Timestamp;
  accepted_at: Timestamp | null;
  accepted_user_id: number | null;
  created_at: Generated<Timestamp>;
  revoked_at: Timestamp | null;
  revoked_by: number | null;
  replaced_at: Timestamp | null;
  replaced_by: number | null;
}

export interface MailOutboxTable {
  id: Generated<number>;
  message_id: string | null;
  from_address: string;
  /** the recipients as one comma-separated text, not JSON */
  to_addresses: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  received_at: Generated<Timestamp>;
}

export interface AuditLogTable {
  id: Generated<number>;
  actor_id: number | null;
  action: string;
  entity: string;
  entity_id: string | null;
  detail: JsonText | null;
  created_at: Generated<Timestamp>;
}

export interface CommoditiesTable {
  id: Generated<number>;
  slug: string;
  name: string;
  family: string;
  botanical_name: string | null;
  created_at: Generated<Timestamp>;
}

export interface SourcesTable {
  id: Generated<number>;
  key: string;
  kind: string;
  authors: string | null;
  year: number | null;
  title: string;
  venue: string | null;
  pages: string | null;
  doi: string | null;
  url: string | null;
  note: string | null;
  created_at: Generated<Timestamp>;
}

export interface CultivarsTable {
  id: Generated<number>;
  commodity_id: number;
  slug: string;
  name: string;
  is_type: Generated<Bool>;
  published_revision_id: number | null;
  created_at: Generated<Timestamp>;
}

export interface PropertyRevisionsTable {
  id: Generated<number>;
  cultivar_id: number;
  number: number;
  status: string;
  author_id: number;
  reviewer_id: number | null;
  review_comment: string | null;
  based_on_id: number | null;
  summary: string | null;
  is_demo: Generated<Bool>;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
  submitted_at: Timestamp | null;
  reviewed_at: Timestamp | null;
  published_at: Timestamp | null;
  superseded_at: Timestamp | null;
}

export interface RevisionValuesTable {
  id: Generated<number>;
  revision_id: number;
  quantity: string;
  variant: Generated<string>;
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
  loading_rate: string | null;
  probe: string | null;
  note: string | null;
  is_typical_default: Generated<Bool>;
  stage: string | null;
  observation: string | null;
  typical_basis: string | null;
  source_id: number | null;
  position: Generated<number>;
}

export interface FollowsTable {
  user_id: number;
  cultivar_id: number;
  created_at: Generated<Timestamp>;
}

export interface ImagesTable {
  id: Generated<number>;
  cultivar_id: number;
  storage_prefix: string;
  original_type: string;
  width: number;
  height: number;
  bytes: number;
  caption: string | null;
  credit: string | null;
  is_demo: Generated<Bool>;
  uploaded_by: number;
  created_at: Generated<Timestamp>;
}

/** The columns every uploaded lab test has: whose file, for which cultivar, and its draft. */
export interface UploadedTestColumns {
  id: Generated<number>;
  cultivar_id: number;
  uploaded_by: number;
  storage_key: string;
  file_name: string;
  rows: number;
  is_demo: Generated<Bool>;
  draft_revision_id: number | null;
  created_at: Generated<Timestamp>;
}

export interface CompressionTestsTable extends UploadedTestColumns {
  diameter_mm: number | null;
  radius1_mm: number | null;
  radius2_mm: number | null;
  poisson: number;
  modulus_mpa: number;
  r_squared: number;
  fit_from_mm: number;
  fit_to_mm: number;
  note: string | null;
}

/** migrations/20261206000100_relaxation_tests.ts: a held-deformation test and its Peleg fit. */
export interface RelaxationTestsTable extends UploadedTestColumns {
  deformation_mm: number;
  specimen: string;
  loading_rate: string | null;
  temperature_c: number | null;
  f0_n: number;
  k1_s: number;
  k2: number;
  r2_linear: number;
  r2_force: number;
}

export interface AssessmentsTable {
  id: Generated<number>;
  owner_id: number;
  check: string;
  title: string;
  notes: string | null;
  inputs: JsonText;
  results: JsonText;
  cultivar_id: number | null;
  revision_id: number | null;
  /** migrations/20261205000400: the commodity record's revision the result inherited from */
  commodity_revision_id: number | null;
  version: Generated<number>;
  parent_id: number | null;
  created_at: Generated<Timestamp>;
  model_version: Generated<string>;
  result_schema: Generated<string>;
  /** null only between a first version's insert and its update in the same transaction */
  root_id: number | null;
}

/** migrations/20261205000200_sessions.ts: one row per signed-in browser, keyed by the token's hash. */
export interface SessionsTable {
  id: string;
  user_id: number;
  /** epoch milliseconds (bigint: a string from PostgreSQL) */
  created_ms: number | string;
  renewed_ms: number | string;
  expires_ms: number | string;
}

/** migrations/20261205000600_grade_rules.ts: the largest bruise a grade tolerates. */
export interface GradeRulesTable {
  id: Generated<number>;
  slug: string;
  name: string;
  commodity_id: number | null;
  kind: string;
  measure: string;
  limit_value: number;
  max_depth_mm: number | null;
  source_id: number | null;
  note: string | null;
  created_by: number | null;
  created_at: Generated<Timestamp>;
}

/** migrations/20261206000200: a value both a draft and a newer publication changed. */
export interface RevisionConflictsTable {
  id: Generated<number>;
  revision_id: number;
  value_key: string;
  label: string;
  base_value: string | null;
  mine_value: string | null;
  theirs_value: string | null;
  theirs_revision_id: number | null;
  created_at: Generated<Timestamp>;
}

export interface Database {
  users: UsersTable;
  sign_in_limits: SignInLimitsTable;
  invitations: InvitationsTable;
  mail_outbox: MailOutboxTable;
  audit_log: AuditLogTable;
  commodities: CommoditiesTable;
  sources: SourcesTable;
  cultivars: CultivarsTable;
  property_revisions: PropertyRevisionsTable;
  revision_values: RevisionValuesTable;
  revision_conflicts: RevisionConflictsTable;
  follows: FollowsTable;
  images: ImagesTable;
  compression_tests: CompressionTestsTable;
  relaxation_tests: RelaxationTestsTable;
  assessments: AssessmentsTable;
  sessions: SessionsTable;
  grade_rules: GradeRulesTable;
}
