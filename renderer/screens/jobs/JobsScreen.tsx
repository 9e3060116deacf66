import { useEffect, useRef, useState } from 'react';
import { useStoreChanges } from '../../hooks/store-info';
import type { JobStatus, JobSummary } from '../../../core/api';
import { useApi } from '../../api';
import { ScreenHeading } from '../../components/ScreenHeading';
import { useCommand } from '../../hooks/commands';
import { useNavigation } from '../../hooks/navigation';
import { useQuery } from '../../hooks/useQuery';
import { useShopData } from '../../hooks/shop-data';
import { SimilarJobsDialog } from '../shared/SimilarJobs';
import { BatchPrint } from './BatchPrint';
import type { Filters } from './JobFilters';
import { FilterBar, noFilters } from './JobFilters';
import type { Sort, SortKey } from './JobTable';
import { JobTable } from './JobTable';
import { Pager } from './Pager';
import { dateRangeProblem, isRangeSet, jobInRange, rangeInput } from '../../model/date-ranges';
import { jobCount } from '../../model/job-count';
import { QuoteSelected } from './QuoteSelected';
import { ShelfNotice, useShelfActions } from './ShelfActions';

export const PAGE_SIZE = 50;

const matches = (j: JobSummary, f: Filters): boolean =>
  (f.status === '' || j.status === f.status) && (f.kind === '' || j.shape.kind === f.kind)
  && (f.material === '' || j.shape.material === f.material) && (f.customerId === '' || String(j.customer?.id) === f.customerId)
  && jobInRange(j, f.dates);

/** Pages follow each other by the key the store hands back with each page (keyset paging). */
function useJobRows(text: string, filters: Filters, sort: Sort, after: string | undefined) {
  const api = useApi();
  const searching = text.trim() !== '';
  const input = {
    status: (filters.status || undefined) as JobStatus | undefined, kind: filters.kind || undefined,
    material: filters.material || undefined, customerId: filters.customerId ? Number(filters.customerId) : undefined,
    archived: filters.shelf === 'archived', dates: isRangeSet(filters.dates) ? rangeInput(filters.dates) : undefined,
    sort: sort.key, direction: sort.direction, limit: PAGE_SIZE, after,
  };
  // A backwards range is not asked for: the list stays as it was while the field says what is wrong.
  const asked = !searching && dateRangeProblem(filters.dates) === null;
  const list = useQuery(asked ? JSON.stringify(input) : null, () => api.listJobs(input));
  const found = useQuery(searching ? text.trim() : null, () => api.findJobs({ text: text.trim(), limit: 200 }), 120);
  if (searching) {
    const jobs = (found.value ?? []).map((h) => h.job).filter((j) => matches(j, filters));
    return { searching, jobs, total: jobs.length, totalAtLeast: false, next: null, state: found.state, error: found.error, reload: found.reload };
  }
  return {
    searching, jobs: list.value?.jobs ?? [], total: list.value?.total ?? 0, totalAtLeast: list.value?.totalAtLeast ?? false, next: list.value?.next ?? null,
    state: list.state, error: list.error, reload: list.reload,
  };
}

/** The job book: search by text, filter, sort, page, find similar springs, print travellers or quote a selection. */
export function JobsScreen() {
  const api = useApi();
  const nav = useNavigation();
  const [text, setText] = useState('');
  const [filters, setFilters] = useState<Filters>(noFilters);
  const [sort, setSort] = useState<Sort>({ key: 'updated', direction: 'desc' });
  // The key of each page opened so far: [first page (none), second, …]; going back pops.
  const [pageKeys, setPageKeys] = useState<(string | undefined)[]>([undefined]);
  const page = pageKeys.length - 1;
  const setPage = (to: number) => setPageKeys((keys) => (to === 0 ? [undefined] : to < keys.length - 1 ? keys.slice(0, to + 1) : keys));
  const [selected, setSelected] = useState<ReadonlySet<number>>(new Set());
  const [similar, setSimilar] = useState<{ spec: unknown; id: number; number: string; quantity: number | null } | null>(null);
  const [similarError, setSimilarError] = useState<string | null>(null);
  const shelf = useShelfActions(() => rows.reload());
  const searchRef = useRef<HTMLInputElement>(null);
  const rows = useJobRows(text, filters, sort, pageKeys[page]);
  const nextPage = () => {
    if (rows.next !== null) setPageKeys((keys) => [...keys, rows.next ?? undefined]);
  };
  const { refresh } = useShopData();
  // Customers added with a job since the list was last open belong in the customer filter.
  useEffect(() => refresh(), [refresh]);
  useCommand('find', () => searchRef.current?.focus());
  useCommand('data-changed', rows.reload);
  // Jobs saved on another desk appear without a restart.
  useStoreChanges(rows.reload);

  const onSort = (key: SortKey) => {
    setSort((s) => (s.key === key ? { key, direction: s.direction === 'asc' ? 'desc' : 'asc' } : { key, direction: key === 'updated' ? 'desc' : 'asc' }));
    setPage(0);
  };
  const select = (id: number, on: boolean) => setSelected((s) => {
    const next = new Set(s);
    if (on) next.add(id); else next.delete(id);
    return next;
  });
  const openSimilar = async (j: JobSummary) => {
    setSimilarError(null);
    const r = await api.getJob({ id: j.id });
    if (r.ok) setSimilar({ spec: r.value.spec, id: j.id, number: j.number, quantity: j.orderQuantity });
    else setSimilarError(r.error.message);
  };

  return (
    <section className="screen" aria-labelledby="jobs-title">
      <div className="screen__head">
        <ScreenHeading id="jobs-title">Jobs</ScreenHeading>
        <div className="screen__actions">
          <BatchPrint selected={selected} onDone={() => setSelected(new Set())} />
          <QuoteSelected selected={selected} onDone={() => { setSelected(new Set()); rows.reload(); }} />
          <button type="button" className="button button--primary" onClick={() => nav.newJob()}>New job</button>
        </div>
      </div>
      <FilterBar text={text} onText={(t) => { setText(t); setPage(0); }} filters={filters}
        onFilters={(f) => { setFilters(f); setPage(0); }} searchRef={searchRef} />
      <p className="listing-status" role="status" aria-live="polite">
        {rows.state === 'loading' && rows.jobs.length === 0 ? 'Loading jobs…'
          : rows.searching ? `${jobCount(rows.total)} match “${text.trim()}”, best match first`
            : jobCount(rows.total, rows.totalAtLeast)}
        {selected.size > 0 ? ` · ${selected.size} selected` : ''}
      </p>
      {rows.error ? <p className="error-text" role="alert">{rows.error.message}</p> : null}
      {similarError ? <p className="error-text" role="alert">{similarError}</p> : null}
      <ShelfNotice shelf={shelf} />
      <div className="table-wrap">
        <JobTable
          jobs={rows.jobs} sort={rows.searching ? null : sort} onSort={onSort} selected={selected} onSelect={select}
          onSelectAll={(on) => rows.jobs.forEach((j) => select(j.id, on))} onOpen={(id) => nav.openJob(id)} onSimilar={(j) => void openSimilar(j)}
          onArchive={(j, on) => void shelf.archive(j, on)} onDelete={(j) => void shelf.remove(j)} archived={!rows.searching && filters.shelf === 'archived'}
          rangeDate={isRangeSet(filters.dates) && filters.dates.field !== 'updated' ? filters.dates.field : null}
        />
        {rows.state === 'ok' && rows.jobs.length === 0 ? <p className="empty">No job matches. Clear the search, the filters or the dates, or start a new job.</p> : null}
      </div>
      {rows.searching ? null : <Pager page={page} pageSize={PAGE_SIZE} total={rows.total} totalAtLeast={rows.totalAtLeast} hasNext={rows.next !== null}
        onPage={(to) => (to > page ? nextPage() : setPage(to))} />}
      <SimilarJobsDialog open={similar !== null} onClose={() => setSimilar(null)} spec={similar?.spec ?? null}
        excludeJobId={similar?.id} quantity={similar?.quantity ?? null} subject={`job ${similar?.number ?? ''}`} />
    </section>
  );
}
