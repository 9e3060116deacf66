import type { JobSummary } from '../../../core/api';
import { formatQuantity } from '../../../core/format';
import { jobDateLabels, statusLabels } from '../../model/labels';
import { kindLabel } from '../../../core/vocabulary';
import { kindEntryOf } from '../../../core/kinds/registry';
import { shopDay } from '../../model/shop-days';

export type SortKey = 'number' | 'updated' | 'customer';
export interface Sort {
  key: SortKey;
  direction: 'asc' | 'desc';
}

interface JobTableProps {
  jobs: JobSummary[];
  /** Null while the rows are text-search hits, which come in order of match. */
  sort: Sort | null;
  onSort(key: SortKey): void;
  selected: ReadonlySet<number>;
  onSelect(id: number, on: boolean): void;
  onSelectAll(on: boolean): void;
  onOpen(id: number): void;
  onSimilar(job: JobSummary): void;
  onArchive(job: JobSummary, archived: boolean): void;
  onDelete(job: JobSummary): void;
  /** The archived list: its newest-first sort is by the date each job was archived. */
  archived?: boolean;
  /** A date range on the created or due date shows that date in its own column. */
  rangeDate?: 'created' | 'due' | null;
}

function SortHeader({ label, k, sort, onSort }: { label: string; k: SortKey; sort: Sort | null; onSort(k: SortKey): void }) {
  const on = sort?.key === k;
  const aria = on ? (sort.direction === 'asc' ? 'ascending' : 'descending') : 'none';
  return (
    <th scope="col" aria-sort={sort ? aria : undefined}>
      {sort ? (
        <button type="button" className="sort" onClick={() => onSort(k)}>
          {label} <span aria-hidden="true">{on ? (sort.direction === 'asc' ? '▲' : '▼') : '↕'}</span>
        </button>
      ) : label}
    </th>
  );
}


/** A job whose stored spec no longer reads still lists, marked, with why beside its spring. */
const rowClass = (j: JobSummary, selected: boolean): string | undefined =>
  [selected ? 'is-selected' : '', j.problem ? 'has-problem' : ''].filter(Boolean).join(' ') || undefined;

export function JobTable({ jobs, sort, onSort, selected, onSelect, onSelectAll, onOpen, onSimilar, onArchive, onDelete, archived = false, rangeDate = null }: JobTableProps) {
  const all = jobs.length > 0 && jobs.every((j) => selected.has(j.id));
  return (
    <table className="table jobs" aria-label="Jobs">
      <thead>
        <tr>
          <th scope="col" className="check">
            <input type="checkbox" aria-label="Select every job on this page" checked={all} onChange={(e) => onSelectAll(e.target.checked)} />
          </th>
          <SortHeader label="Job" k="number" sort={sort} onSort={onSort} />
          <SortHeader label="Customer" k="customer" sort={sort} onSort={onSort} />
          <th scope="col">Part / drawing</th>
          <th scope="col">Status</th>
          <th scope="col">Spring</th>
          <th scope="col" className="num">d</th>
          <th scope="col" className="num">OD</th>
          <th scope="col" className="num">L0</th>
          <th scope="col" className="num">Rate</th>
          {rangeDate ? <th scope="col">{jobDateLabels[rangeDate]}</th> : null}
          <SortHeader label={archived ? 'Archived' : jobDateLabels.updated} k="updated" sort={sort} onSort={onSort} />
          <th scope="col"><span className="sr-only">Actions</span></th>
        </tr>
      </thead>
      <tbody>
        {jobs.map((j) => {
          const u = j.shape.units;
          // Each kind is compared on its own length and rate (core/kinds: torsion on body length and rate per degree).
          const compared = kindEntryOf(j.shape.kind).shape;
          return (
            <tr key={j.id} onDoubleClick={() => onOpen(j.id)} className={rowClass(j, selected.has(j.id))}>
              <td className="check">
                <input type="checkbox" aria-label={`Select job ${j.number}`} checked={selected.has(j.id)} onChange={(e) => onSelect(j.id, e.target.checked)} />
              </td>
              <td><button type="button" className="link" onClick={() => onOpen(j.id)} aria-label={`Open job ${j.number}`}>{j.number}</button></td>
              <td>{j.customer?.name ?? <span className="muted">—</span>}</td>
              {/* Part, drawing and material ids are identifiers: never broken at a hyphen or before their revision. */}
              <td><span className="nowrap">{j.partNumber || <span className="muted">—</span>}</span><br />
                <span className="muted nowrap">{j.drawingNumber}{j.drawingRevision ? ` rev ${j.drawingRevision}` : ''}</span></td>
              <td><span className={`status status--${j.status}`}>{statusLabels[j.status]}</span>
                {j.archivedAt ? <><br /><span className="muted">archived {shopDay(j.archivedAt)}</span></> : null}</td>
              <td>{kindLabel(j.shape.kind)}<br /><span className="muted nowrap">{j.shape.material}</span>
                {j.problem ? <><br /><span className="error-text job-problem" role="note">{j.problem.message}</span></> : null}</td>
              <td className="num">{formatQuantity(j.shape.wireDiameter, 'length', u)}</td>
              <td className="num">{formatQuantity(j.shape.outerDiameter, 'length', u)}</td>
              <td className="num">{formatQuantity(j.shape.freeLength, 'length', u)}{compared.lengthNote ? <><br /><span className="muted">{compared.lengthNote}</span></> : null}</td>
              <td className="num">{formatQuantity(j.shape.rate, compared.rateQuantity, u)}</td>
              {rangeDate ? <td className="nowrap">{rangeDate === 'due' ? (j.dueDate ?? '—') : shopDay(j.createdAt)}</td> : null}
              <td className="nowrap">{shopDay(archived && j.archivedAt ? j.archivedAt : j.updatedAt)}</td>
              <td><div className="row-actions">
                <button type="button" className="button button--small" onClick={() => onSimilar(j)} aria-label={`Find jobs similar to ${j.number}`}>Similar</button>
                <button type="button" className="button button--small button--quiet" onClick={() => onArchive(j, j.archivedAt === null)}
                  aria-label={`${j.archivedAt === null ? 'Archive' : 'Put back'} job ${j.number}`}>{j.archivedAt === null ? 'Archive' : 'Put back'}</button>
                {j.status === 'draft' ? (
                  <button type="button" className="button button--small button--quiet" onClick={() => onDelete(j)} aria-label={`Delete draft ${j.number}`}>Delete</button>
                ) : null}
              </div></td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
