import { Badge, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { SummaryTable, type SummaryColumn } from '../../../components/summary-table';
import { formatDateTime } from '../../../lib/format';
import type { ReservesCaseSummary } from '../../../types/reserves';
import { formatFieldVolume } from '../utils/format-volume';
import { CaseStatusBadge } from './status-badge';

export interface CasesListProps {
  assetId: string;
  cases: readonly ReservesCaseSummary[];
}

const vol = (c: ReservesCaseSummary, k: 'p90' | 'p50' | 'p10' | 'deterministic') => (c.recoverable ? c.recoverable[k] : null);

/** The asset's reserves cases: status, target formation, wells, staleness and recoverable P90/P50/P10. */
export function CasesList({ assetId, cases }: CasesListProps) {
  const cell = (k: 'p90' | 'p50' | 'p10' | 'deterministic') => (c: ReservesCaseSummary) =>
    c.recoverable ? (
      <span className={c.resultsCurrent ? undefined : 'rc-outdated'} title={c.resultsCurrent ? undefined : 'From an earlier revision: run the case again'}>
        {formatFieldVolume(c.recoverable[k], c.recoverable.unit)}
      </span>
    ) : (
      <Text color="gray">not run</Text>
    );
  const columns: SummaryColumn<ReservesCaseSummary>[] = [
    {
      id: 'name',
      header: 'Case',
      kind: 'text',
      value: (c) => c.name,
      cell: (c) => (
        <Link className="strong-link" to={`/assets/${assetId}/reserves/${c.id}`}>
          {c.name}
        </Link>
      ),
    },
    { id: 'formation', header: 'Formation', kind: 'text', value: (c) => c.formationName },
    { id: 'fluid', header: 'Fluid', kind: 'text', value: (c) => c.fluid },
    { id: 'status', header: 'Status', kind: 'text', value: (c) => c.status, cell: (c) => <CaseStatusBadge status={c.status} /> },
    {
      id: 'wells',
      header: 'Wells',
      kind: 'number',
      digits: 0,
      value: (c) => c.wellCount,
      cell: (c) => (
        <>
          {c.wellCount}
          {c.staleSources ? (
            <Badge color="orange" ml="2" variant="soft">
              {c.staleSources} stale
            </Badge>
          ) : null}
        </>
      ),
    },
    { id: 'det', header: 'Recoverable, deterministic', kind: 'number', value: (c) => vol(c, 'deterministic'), cell: cell('deterministic') },
    { id: 'p90', header: 'P90', kind: 'number', value: (c) => vol(c, 'p90'), cell: cell('p90') },
    { id: 'p50', header: 'P50', kind: 'number', value: (c) => vol(c, 'p50'), cell: cell('p50') },
    { id: 'p10', header: 'P10', kind: 'number', value: (c) => vol(c, 'p10'), cell: cell('p10') },
    { id: 'updated', header: 'Updated', kind: 'text', value: (c) => c.updatedAt, cell: (c) => formatDateTime(c.updatedAt) },
  ];
  return (
    <SummaryTable
      name="Reserves cases"
      rows={cases}
      columns={columns}
      rowId={(c) => c.id}
      emptyText="No reserves case yet."
      footnote="P90 is the low estimate (exceeded with 90 % probability), P10 the high estimate (SPE-PRMS). Greyed volumes come from an earlier revision."
    />
  );
}
