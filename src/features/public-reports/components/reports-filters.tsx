import { MODEL_CATEGORIES } from '#shared/schemas/models.ts';
import type { PublicReportSummary } from '#shared/schemas/reports.ts';
import { SearchBox } from '#src/components/data-table/search-box.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import type { ListSearch } from '#src/lib/list-search-params.ts';
import type { ReportsIndexSearch } from '../hooks/use-reports-index-search.ts';
import { categoryLabel } from '../utils/category.ts';

/** Search, category and maker: each choice goes to the URL at once. */
export function ReportsFilters({ reports, list }: { reports: readonly PublicReportSummary[]; list: ListSearch<ReportsIndexSearch> }) {
  const { query } = list;
  const makers = [...new Set(reports.map((r) => r.maker))].sort((a, b) => a.localeCompare(b, 'en'));
  // A maker named in the URL stays choosable even if no report of theirs is listed any more.
  if (query.maker && !makers.includes(query.maker)) makers.push(query.maker);
  return (
    <div className="flex flex-wrap items-end gap-4">
      <SearchBox label="Search reports" hint="Title, maker or model" value={query.q} onSearch={list.setSearch} />
      <div className="w-48">
        <SelectField
          label="Category"
          value={query.category ?? ''}
          onChange={(e) => list.setFilter('category', (e.target.value || undefined) as ReportsIndexSearch['category'])}
          options={[{ value: '', label: 'All categories' }, ...MODEL_CATEGORIES.map((c) => ({ value: c, label: categoryLabel(c) }))]}
        />
      </div>
      <div className="w-56">
        <SelectField
          label="Maker"
          value={query.maker ?? ''}
          onChange={(e) => list.setFilter('maker', e.target.value || undefined)}
          options={[{ value: '', label: 'All makers' }, ...makers.map((m) => ({ value: m, label: m }))]}
        />
      </div>
    </div>
  );
}
