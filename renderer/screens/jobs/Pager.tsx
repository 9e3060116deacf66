import { jobTotal } from '../../model/job-count';

/** Where the page is in the list; with a counted-to-a-cap total ("10 000+") the page count is open-ended. */
export function Pager({ page, pageSize, total, totalAtLeast = false, hasNext, onPage }: {
  page: number; pageSize: number; total: number; totalAtLeast?: boolean; hasNext: boolean; onPage(page: number): void;
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : page * pageSize + 1;
  const last = totalAtLeast ? (page + 1) * pageSize : Math.min(total, (page + 1) * pageSize);
  return (
    <nav className="pager" aria-label="Pages of jobs">
      <button type="button" className="button" disabled={page === 0} onClick={() => onPage(page - 1)}>Previous page</button>
      <span className="pager__where">Jobs {jobTotal(first)}–{jobTotal(last)} of {jobTotal(total, totalAtLeast)} · page {page + 1} of {jobTotal(pages, totalAtLeast)}</span>
      <button type="button" className="button" disabled={!hasNext || (!totalAtLeast && page + 1 >= pages)} onClick={() => onPage(page + 1)}>Next page</button>
    </nav>
  );
}
