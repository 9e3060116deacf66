import type { Ref } from 'react';
import { jobStatuses } from '../../../core/api';
import { springKinds } from '../../../core/spec';
import { PlainInput, PlainSelect } from '../../components/Plain';
import { useShopData } from '../../hooks/shop-data';
import { statusLabels } from '../../model/labels';
import { kindLabel } from '../../../core/vocabulary';
import type { DateRange } from '../../model/date-ranges';
import { noDateRange } from '../../model/date-ranges';
import { DateRangeFilter } from './DateRange';

export interface Filters {
  status: string;
  kind: string;
  material: string;
  customerId: string;
  /** '' lists the jobs in use; 'archived' the archived ones. A text search finds both. */
  shelf: '' | 'archived';
  dates: DateRange;
}

export const noFilters: Filters = { status: '', kind: '', material: '', customerId: '', shelf: '', dates: noDateRange };

interface FilterBarProps {
  text: string;
  onText(text: string): void;
  filters: Filters;
  onFilters(filters: Filters): void;
  searchRef: Ref<HTMLInputElement>;
}

export function FilterBar({ text, onText, filters, onFilters, searchRef }: FilterBarProps) {
  const shop = useShopData();
  const set = (key: Exclude<keyof Filters, 'dates'>) => (value: string) => onFilters({ ...filters, [key]: value });
  return (
    <div role="search" className="filterbar" aria-label="Find jobs">
      <div className="filterbar__search">
        <PlainInput
          label="Search" type="search" value={text} onChange={onText} inputRef={searchRef}
          placeholder="customer, part, drawing, grade, size (1.6)…" hint="Ctrl+F or / to come back here"
        />
      </div>
      <PlainSelect label="Status" value={filters.status} onChange={set('status')}
        choices={[{ value: '', label: 'Any status' }, ...jobStatuses.map((s) => ({ value: s, label: statusLabels[s] }))]} />
      <PlainSelect label="Kind" value={filters.kind} onChange={set('kind')}
        choices={[{ value: '', label: 'Any kind' }, ...springKinds.map((k) => ({ value: k, label: kindLabel(k) }))]} />
      <PlainSelect label="Material" value={filters.material} onChange={set('material')}
        choices={[{ value: '', label: 'Any material' }, ...shop.grades.map((g) => ({ value: g.id, label: g.name }))]} />
      <PlainSelect label="Customer" value={filters.customerId} onChange={set('customerId')}
        choices={[{ value: '', label: 'Any customer' }, ...shop.customers.map((c) => ({ value: String(c.id), label: c.name }))]} />
      <PlainSelect label="List" value={filters.shelf} onChange={set('shelf')}
        choices={[{ value: '', label: 'Jobs in use' }, { value: 'archived', label: 'Archived jobs' }]} />
      <DateRangeFilter range={filters.dates} onRange={(dates) => onFilters({ ...filters, dates })} />
    </div>
  );
}
