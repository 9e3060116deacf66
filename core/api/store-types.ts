import type { Spec, SpringKind } from '../spec';
import type { Settings } from '../settings/schema';
import type { JobStatus } from './store-schemas';
import type { IssueDecision } from '../quoting/problems';
import type { JobJudgement } from '../quoting/judgement';

/** What the store returns. Shape numbers are internal units: mm and N/mm. */
export interface Customer {
  id: number;
  name: string;
  /** The person quotes are addressed to. */
  contact: string;
  email: string;
  phone: string;
  /** Postal address, one printed line each. */
  addressLines: string[];
  /** Payment terms agreed with this customer; '' prints the shop's default. */
  paymentTerms: string;
}

export interface JobShape {
  kind: SpringKind;
  material: string;
  materialFamily: string;
  units: 'metric' | 'inch';
  wireDiameter: number;
  meanDiameter: number;
  outerDiameter: number;
  /** Free length (compression), free length inside the ends (extension), body length (torsion). */
  freeLength: number;
  activeCoils: number;
  /** N/mm for compression and extension, N·mm per degree for torsion. */
  rate: number;
}

/** What the estimator types about a job besides its spec: the same fields in a job, a revision and an export record. */
export interface JobDetails {
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  status: JobStatus;
  notes: string;
  dueDate: string | null;
  orderQuantity: number | null;
  leadTimeDays: number | null;
  /** The estimator's routing and price overrides, each with its reason. */
  judgement: JobJudgement;
}

/**
 * Why a stored record no longer reads with this version of the program (a grade since withdrawn, a spec
 * written by a newer version, a damaged row). The record stays in the store as it was; `path` names the field.
 */
export interface StoredProblem {
  code: string;
  message: string;
  path: string;
}

export interface JobSummary extends JobDetails {
  id: number;
  number: string;
  customer: { id: number; name: string } | null;
  /** How many times the job has been saved; the latest revision number. */
  revision: number;
  createdAt: string;
  updatedAt: string;
  /** When the job left the default list; null while it is listed. Search still finds an archived job. */
  archivedAt: string | null;
  shape: JobShape;
  /** Present when the stored spec no longer reads: the job still lists, and opening it reports this. */
  problem?: StoredProblem;
}

/** Another job a job is linked to, and when the link was made. */
export interface JobLink {
  id: number;
  number: string;
  at: string;
}

export interface Job extends JobSummary {
  spec: Spec;
  /**
   * Present while a working session is open: its autosaves are in the job, and become one revision when it closes.
   * `desk` is the editor that owns it (the one that autosaved first) and `by` who is typing there ('' when not
   * recorded): another desk sees who is editing, and its own autosaves are refused until the session closes.
   */
  working?: { baseRevision: number; openedAt: string; savedAt: string; saves: number; desk: string; by: string };
  /** The past job this one was made from, and the jobs made from this one. */
  lineage: { copiedFrom: JobLink | null; copiedTo: JobLink[] };
}

/** A deleted draft: it can be brought back with undoDeleteJob while this record is kept. */
export interface DeletedJob {
  jobId: number;
  number: string;
  deletedAt: string;
}

/** How near a past job is, in the words an estimator reads at a glance. */
export type MatchWords = 'same spring' | 'very close' | 'close' | 'loosely similar' | 'far';

/** The last price quoted for a past job, at the quantity break nearest the asked quantity. */
export interface LastQuotedPrice {
  quoteNumber: string;
  issuedAt: string;
  quantity: number;
  unitPrice: number;
  currency: string;
}

export interface JobPage {
  jobs: JobSummary[];
  total: number;
  /**
   * True when `total` is a lower bound: a date range is counted only up to a cap (db/search/list.ts
   * COUNT_CAP), since an exact count would read every job in the range of a large store.
   */
  totalAtLeast: boolean;
  limit: number;
  offset: number;
  /** Pass as `after` for the page that follows; null on the last page. */
  next: string | null;
}

/** The fields of a job as one revision saved them. */
export interface RevisionFields extends JobDetails {
  customerId: number | null;
  customerName: string | null;
}

export interface JobRevision {
  jobId: number;
  revision: number;
  savedAt: string;
  /** "created", "saved", "status", "restored revision 3", "imported". */
  reason: string;
  /** Who saved it: the signed-in name or the database user; '' for revisions saved before this was kept. */
  madeBy: string;
  fields: RevisionFields;
  /** Null when this revision's stored spec no longer reads; `problem` then says why. */
  spec: Spec | null;
  problem?: StoredProblem;
}

export interface TextHit {
  job: JobSummary;
  /** bm25 rank: lower is a better match. */
  rank: number;
}

export type DimensionName = 'wireDiameter' | 'meanDiameter' | 'outerDiameter' | 'freeLength' | 'activeCoils' | 'rate';

export interface SimilarJob {
  id: number;
  number: string;
  job: JobSummary;
  /** exp(−distance): 1 for the same spring, falling towards 0. */
  score: number;
  distance: number;
  /** Per dimension: "same" or a signed percentage of the past job against the asked one, e.g. "+3 %". */
  differences: Record<DimensionName, string> & { material: 'same' | 'same family' | 'other family' };
  /** (past − asked) / asked per dimension. */
  relative: Record<DimensionName, number>;
  summary: string;
  /** "very close", "close"… and the biggest difference named, e.g. "close: OD 9 % larger". */
  match: { words: MatchWords; biggest: string | null; text: string };
  lastQuoted: LastQuotedPrice | null;
}

/** One line of a quotation as its lists show it: the job it quotes, as the job stood at issue. */
export interface QuoteLineSummary {
  /** 1, 2, …: the item number printed on the quotation. */
  line: number;
  jobId: number;
  jobRevision: number;
  jobNumber: string;
  partNumber: string;
}

export interface QuoteSummary {
  id: number;
  number: string;
  /** The first line's job (a one-line quotation's only one); `lines` names every job quoted. */
  jobId: number;
  jobRevision: number;
  issuedAt: string;
  validityDays: number;
  validUntil: string;
  currency: string;
  lines: QuoteLineSummary[];
}

/** A line as issued: the job, its spec and the figures it was quoted at. */
export interface QuoteLine extends QuoteLineSummary {
  job: RevisionFields & { number: string };
  spec: Spec;
  prices: unknown;
  quantityBreaks: unknown[];
}

export interface Quote extends QuoteSummary {
  /** The first line's job, spec, prices and breaks, as a one-line quote has always kept them. */
  job: RevisionFields & { number: string };
  spec: Spec;
  /** The shop settings at issue, shared by every line. */
  settings: Settings;
  prices: unknown;
  quantityBreaks: unknown[];
  document: unknown;
  /** The estimator's decision on open problems at issue (reason and each problem); null when there were none. */
  decision: IssueDecision | null;
  /** Who issued it; '' for quotes issued before this was kept. */
  madeBy: string;
  lines: QuoteLine[];
}

export interface Attachment {
  id: number;
  jobId: number;
  name: string;
  mimeType: string;
  size: number;
  sha256: string;
  addedAt: string;
}

export interface AttachmentData extends Attachment {
  dataBase64: string;
}

export interface ExportResult {
  format: 'json' | 'csv';
  count: number;
  file?: string;
  text?: string;
  /** Jobs whose stored spec no longer reads: exported as stored, and named here so they can be put right. */
  problems?: StoredProblem[];
}

export interface ImportResult {
  imported: { id: number; number: string }[];
  /**
   * What the imported jobs named but the import could not keep, e.g. a link to a job neither in the file
   * nor in the store; the jobs themselves are imported. `path` names the field of the file.
   */
  problems?: StoredProblem[];
}

/** A re-index of the search numbers: how many jobs were looked at, recomputed, moved, and which could not be. */
export interface ReindexResult {
  /** The engine version the recomputed numbers now carry. */
  engineVersion: number;
  checked: number;
  reindexed: number;
  /** Jobs whose numbers came out different from what the index held. */
  changed: number;
  /** Jobs left as they were because their stored spec no longer reads. */
  problems: StoredProblem[];
}

export interface BackupResult {
  file: string;
  bytes: number;
  version: number;
}

export interface RestoreResult {
  restoredFrom: string;
  /** The store as it was before the restore, kept beside it. */
  previousKeptAs: string | null;
  version: number;
}

/** The store the program works in, as the title bar and the Data screen show it. */
export interface StoreInfo {
  backend: 'sqlite' | 'postgres';
  /** The file, or host:port/database of a server: never a user name or password of the connection. */
  name: string;
  /** Who saves are recorded as by: the signed-in name, else the database user or the computer's account. */
  author: string;
  /** Why nothing can be saved, or null. */
  readOnly: string | null;
  /** Moves when another desk (or program) commits a change: an open job list reads again when it does. */
  changeMark: string;
  /** The file's damage check (PRAGMA quick_check); null for a server store, whose server keeps its own pages. */
  damageCheck: DamageCheckInfo | null;
  /**
   * The server store the next start of this program opens, as chosen on the Data screen and saved in the
   * program's own settings file (the connection string without its password); null when the next start opens
   * the program's own file, or the program does not remember a choice (the command line).
   */
  nextStart: { location: string; passwordLeftOut: boolean } | null;
}

/**
 * Where a store file's damage check stands. Small stores are checked before they open (passed at the open);
 * large ones open first and are checked while the program works; a failed check makes the store read-only.
 * Times are ISO 8601.
 */
export type DamageCheckInfo =
  | { state: 'running'; since: string }
  | { state: 'passed'; at: string }
  | { state: 'failed'; at: string; problem: string }
  | { state: 'not-checked'; reason: string };
