export function Pager({ page, pageSize, total, hasNext, onPage }: {
  page: number; pageSize: number; total: number; hasNext: boolean; onPage(page: number): void;
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : page * pageSize + 1;
  const last = Math.min(total, (page + 1) * pageSize);
  return (
    <nav className="pager" aria-label="Pages of jobs">
      <button type="button" className="button" disabled={page === 0} onClick={() => onPage(page - 1)}>Previous page</button>
      <span className="pager__where">Jobs {first}–{last} of {total} · page {page + 1} of {pages}</span>
      <button type="button" className="button" disabled={!hasNext || page + 1 >= pages} onClick={() => onPage(page + 1)}>Next page</button>
    </nav>
  );
}
