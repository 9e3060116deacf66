import type { ImportResult } from '../../core/api/store';
import type { FieldError, Result } from '../../core/result';
import { fail, fieldError, formatPath, ok } from '../../core/result';
import { zodErrors } from '../../core/validation';
import { failure } from '../errors';
import type { StoreResult } from '../errors';
import type { CheckedJob } from '../jobs/input';
import { checkSpec } from '../jobs/input';
import { NewJobWriter } from '../jobs/write';
import type { Store } from '../store';
import { isSqliteStore } from '../store';
import { DeferredUpkeep } from './deferred-upkeep';
import { importRecordSchema } from './document';
import type { RecordRelations } from './import-relations';
import { ImportRelations } from './import-relations';
import type { CheckedFirstOff } from './first-off';
import { checkImportedFirstOff, writeImportedFirstOff } from './first-off';

export interface ImportItem {
  /** "jobs[3]" for JSON, "lines[7]" (line 7 of the file) for CSV. */
  at: PropertyKey[];
  raw: unknown;
}

interface CheckedItem extends CheckedJob {
  at: string;
  number?: string | undefined;
  createdAt?: string | undefined;
  updatedAt?: string | undefined;
  archivedAt?: string | null | undefined;
  firstOff: CheckedFirstOff[];
  relations: RecordRelations;
}

function checkItem(item: ImportItem): Result<CheckedItem> {
  const parsed = importRecordSchema.safeParse(item.raw);
  const spec = typeof item.raw === 'object' && item.raw !== null ? (item.raw as { spec?: unknown }).spec : undefined;
  const specCheck = checkSpec(spec, [...item.at, 'spec']);
  if (!parsed.success || !specCheck.ok) {
    return fail([...(parsed.success ? [] : zodErrors(parsed.error, item.at)), ...(specCheck.ok ? [] : specCheck.errors)]);
  }
  const { number, createdAt, updatedAt, archivedAt, copiedFrom, enquiry, firstOff: rawFirstOff, ...fields } = parsed.data;
  const firstOff = checkImportedFirstOff(rawFirstOff, specCheck.value.spec, item.at);
  if (!firstOff.ok) return firstOff;
  return ok({
    at: formatPath(item.at), fields, ...specCheck.value, number, createdAt, updatedAt, archivedAt, firstOff: firstOff.value, relations: { copiedFrom, enquiry },
  });
}

/** Field errors kept for the answer; the count of bad records goes on past it. */
const KEPT_ERRORS = 1000;

/**
 * An import writes its first jobs with the search upkeep job by job (a small import never touches the
 * schema), then sets it aside (DeferredUpkeep). It looks again each time the count doubles: once it has
 * brought at least as many jobs as the store held, the job list's indexes are built afresh at the end.
 */
const FIRST_UPKEEP_LOOK = 1000;

/**
 * One import: each record is checked as it arrives and, while every record so far was good, written at
 * once inside the caller's transaction. A bad record stops the writing (the caller rolls back) but not the
 * checking, so the answer names every bad record, as a check of the whole file first would.
 */
export class ImportRun {
  private readonly errors: FieldError[] = [];
  private badRecords = 0;
  private readonly seen = new Map<string, string>();
  readonly imported: ImportResult['imported'] = [];
  private readonly writer: NewJobWriter;
  private upkeep: DeferredUpkeep | undefined;
  private nextUpkeepLook = FIRST_UPKEEP_LOOK;
  private jobsBefore: number | undefined;
  private readonly relations: ImportRelations;

  constructor(private readonly store: Store, private readonly renumber: boolean) {
    this.writer = new NewJobWriter(store);
    this.relations = new ImportRelations(store, this.writer, renumber);
  }

  /** Links the import could not keep (their jobs are imported); named by field path. */
  get problems(): FieldError[] {
    return this.relations.problems;
  }

  get failed(): boolean {
    return this.badRecords > 0;
  }

  reject(errors: FieldError[]): void {
    this.badRecords++;
    this.errors.push(...errors.slice(0, Math.max(0, KEPT_ERRORS - this.errors.length)));
  }

  private numberError(item: CheckedItem): FieldError | undefined {
    if (this.renumber || item.number === undefined) return undefined;
    const path = `${item.at}.number`;
    const earlier = this.seen.get(item.number);
    this.seen.set(item.number, item.at);
    if (earlier) return fieldError('duplicate-number', path, `job number ${item.number} is also used by ${earlier}`);
    if (this.store.sql('SELECT 1 FROM jobs WHERE number = ?').get(item.number) !== undefined) {
      return fieldError('duplicate-number', path, `job number ${item.number} is already in this store (import with renumber to give new numbers)`);
    }
    return undefined;
  }

  take(item: ImportItem): void {
    const checked = checkItem(item);
    if (!checked.ok) return this.reject(checked.errors);
    const c = checked.value;
    const clash = this.numberError(c) ?? this.relations.enquiryError(c.relations.enquiry, c.at);
    if (clash) return this.reject([clash]);
    if (this.failed) return;
    const written = this.writer.write(c, {
      number: this.renumber ? undefined : c.number, reason: 'imported', createdAt: c.createdAt, updatedAt: c.updatedAt, archivedAt: c.archivedAt,
    }, c.at);
    writeImportedFirstOff(this.store, written.id, c.firstOff);
    this.relations.wrote(written.id, c.number, c.relations, c.at);
    this.imported.push(written);
    if (this.imported.length === this.nextUpkeepLook) this.lookAtUpkeep();
  }

  private lookAtUpkeep(): void {
    this.nextUpkeepLook *= 2;
    if (!isSqliteStore(this.store) || this.upkeep?.listIndexesDropped) return;
    this.upkeep ??= DeferredUpkeep.begin(this.store.db);
    this.jobsBefore ??= (this.store.sql('SELECT count(*) AS n FROM jobs').get() as { n: number }).n - this.imported.length;
    if (this.imported.length >= this.jobsBefore) this.upkeep.dropListIndexes();
  }

  /** What is left once every record was good (links to later jobs, the number sequence, the search upkeep set aside); before the commit. */
  finish(): void {
    this.relations.finish();
    this.writer.finish();
    this.upkeep?.finish();
  }

  result(): ImportResult {
    return { imported: this.imported, ...(this.problems.length > 0 ? { problems: this.problems } : {}) };
  }

  refusal(): StoreResult<never> {
    const first = this.errors[0]!;
    return failure(first.code, `${this.badRecords} record(s) are not valid, nothing was imported: ${first.path}: ${first.message}`, first.path, this.errors);
  }
}

