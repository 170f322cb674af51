import { Badge, Button, Callout, Flex, Text } from '@radix-ui/themes';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { SummaryTable, type SummaryColumn } from '../../../components/summary-table';
import { fileStem } from '../../../lib/svg-export';
import type { FormationDto, ZoneTableRow } from '../../../types/workbench';
import { exportZoneTable, MIME } from '../api/exports';
import { useZoneTable } from '../api/zone-table';
import { useDownload } from '../hooks/use-download';

export interface AssetZoneTableProps {
  assetId: string;
  assetName: string;
  formations: readonly FormationDto[];
}

const STATUS_COLOUR = { draft: 'gray', submitted: 'amber', approved: 'jade', returned: 'tomato' } as const;

function columns(assetId: string, unit: string, hasTvd: boolean): SummaryColumn<ZoneTableRow>[] {
  const n = (id: keyof ZoneTableRow & string, header: string, digits: number, u?: string, hidden?: boolean): SummaryColumn<ZoneTableRow> => ({
    id,
    header,
    unit: u,
    kind: 'number',
    digits,
    value: (r) => (typeof r[id] === 'number' ? (r[id] as number) : null),
    hiddenByDefault: hidden,
  });
  const cols: SummaryColumn<ZoneTableRow>[] = [
    {
      id: 'wellName',
      header: 'Well',
      kind: 'text',
      value: (r) => r.wellName,
      cell: (r) => (
        <Link className="strong-link" to={`/assets/${assetId}/wells/${r.wellId}/workbench`}>
          {r.wellName}
        </Link>
      ),
    },
    { id: 'formation', header: 'Formation', kind: 'text', value: (r) => r.formation },
    {
      id: 'status',
      header: 'Version',
      kind: 'text',
      value: (r) => (r.status ? `v${r.version} ${r.status}` : 'none'),
      cell: (r) =>
        r.status ? (
          <Badge size="1" variant="soft" color={STATUS_COLOUR[r.status]}>
            v{r.version} · {r.status}
          </Badge>
        ) : (
          <Text size="1" color="gray">
            none
          </Text>
        ),
    },
    n('gross', 'Gross', 2, unit),
    n('netReservoir', 'Net res.', 2, unit),
    n('netPay', 'Net pay', 2, unit),
    n('ntg', 'N/G', 3),
    n('phiMean', 'Porosity', 3, 'v/v'),
    n('swMean', 'Sw', 3, 'v/v'),
    n('vshMean', 'Vsh', 3, 'v/v'),
    n('phiH', 'Phi-h', 3, unit),
    n('hcpt', 'HCPT', 3, unit),
  ];
  if (hasTvd) {
    const tv: [string, string][] = [
      ['grossTvd', 'Gross TVD'],
      ['netPayTvd', 'Net pay TVD'],
      ['netPayTvt', 'Net pay TVT'],
      ['phiHTvd', 'Phi-h TVD'],
      ['hcptTvd', 'HCPT TVD'],
    ];
    for (const [k, label] of tv) cols.push(n(k, label, 2, unit, k !== 'netPayTvd'));
  }
  return cols;
}

/**
 * Zone summaries across the asset's wells (the latest version of each well), for one formation
 * or all; sortable, filterable, columns to choose; CSV and XLSX made by the server.
 */
export function AssetZoneTable({ assetId, assetName, formations }: AssetZoneTableProps) {
  const [formationId, setFormationId] = useState<string>('');
  const [approvedOnly, setApprovedOnly] = useState(false);
  const table = useZoneTable(assetId, formationId || null, approvedOnly);
  const download = useDownload();
  const rows = table.data ?? [];
  const unit = rows[0]?.depthUnit ?? '';
  const hasTvd = rows.some((r) => typeof r.netPayTvd === 'number');
  const cols = useMemo(() => columns(assetId, unit, hasTvd), [assetId, unit, hasTvd]);
  const formationName = formations.find((f) => f.id === formationId)?.name;
  const stem = fileStem(`${assetName}-${formationName ?? 'all-formations'}-zones${approvedOnly ? '-approved' : ''}`);

  return (
    <Flex direction="column" gap="3">
      <Flex gap="2" align="center" wrap="wrap">
        <label htmlFor="zone-table-formation" className="zp-inline-label">
          Formation
        </label>
        <select id="zone-table-formation" className="native-select" value={formationId} onChange={(e) => setFormationId(e.currentTarget.value)}>
          <option value="">All formations</option>
          {formations.map((f) => (
            <option key={f.id} value={f.id}>
              {f.name}
            </option>
          ))}
        </select>
        <label className="zp-check">
          <input type="checkbox" checked={approvedOnly} onChange={(e) => setApprovedOnly(e.currentTarget.checked)} /> Approved versions only
        </label>
      </Flex>
      {table.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>The zone table could not be loaded: {table.error.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <SummaryTable
          name="Zone summary across wells"
          rows={rows}
          columns={cols}
          rowId={(r) => `${r.wellId}-${r.formation}`}
          initialSort={[{ id: 'wellName', desc: false }]}
          emptyText={table.isPending ? 'Loading…' : 'No interpretation saved in this asset yet.'}
          toolbar={
            <>
              <Button
                variant="soft"
                loading={download.busy === 'csv'}
                onClick={() => download.run('csv', () => exportZoneTable(assetId, 'csv', formationId || null, approvedOnly), `${stem}.csv`, MIME.csv)}
              >
                Export CSV
              </Button>
              <Button
                variant="soft"
                loading={download.busy === 'xlsx'}
                onClick={() => download.run('xlsx', () => exportZoneTable(assetId, 'xlsx', formationId || null, approvedOnly), `${stem}.xlsx`, MIME.xlsx)}
              >
                Export XLSX
              </Button>
            </>
          }
          footnote={
            approvedOnly
              ? 'Newest approved version of each well. Averages over net pay: porosity and Vsh by thickness, Sw by pore volume.'
              : 'Newest version of each well; draft and returned numbers may still change. Averages over net pay: porosity and Vsh by thickness, Sw by pore volume.'
          }
        />
      )}
      {download.error ? (
        <Text size="1" color="tomato" role="alert">
          {download.error}
        </Text>
      ) : null}
    </Flex>
  );
}
