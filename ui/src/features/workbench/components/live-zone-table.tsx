import type { ZoneSummary } from '@poreline/core';
import { useMemo, type ReactNode } from 'react';
import { SummaryTable, type SummaryColumn } from '../../../components/summary-table';

export interface LiveZoneTableProps {
  summaries: readonly ZoneSummary[];
  depthUnit: string;
  colours: Readonly<Record<string, string>>;
  hasSurvey: boolean;
  toolbar?: ReactNode;
}

/**
 * The well's zone summary, recomputed in the browser as cutoffs move (role table, named
 * "Zone summary"). Averages over net pay (as the server's zone tables): porosity and Vsh by
 * thickness, Sw by pore volume. Thickness in MD, with TVD and TVT columns to choose when the well has a survey.
 */
export function LiveZoneTable({ summaries, depthUnit, colours, hasSurvey, toolbar }: LiveZoneTableProps) {
  const columns = useMemo(() => zoneColumns(depthUnit, colours, hasSurvey), [depthUnit, colours, hasSurvey]);
  return (
    <SummaryTable
      name="Zone summary"
      rows={summaries}
      columns={columns}
      rowId={(s) => s.zone}
      emptyText="No zones evaluated yet."
      toolbar={toolbar}
      footnote="Averages over net pay: porosity and Vsh thickness-weighted, Sw pore-volume-weighted. Cutoffs inclusive."
    />
  );
}

function zoneColumns(u: string, colours: Readonly<Record<string, string>>, survey: boolean): SummaryColumn<ZoneSummary>[] {
  const cols: SummaryColumn<ZoneSummary>[] = [
    {
      id: 'zone',
      header: 'Zone',
      kind: 'text',
      value: (s) => s.zone,
      cell: (s) => (
        <span className="nowrap">
          <span className="swatch" style={{ background: colours[s.formation] }} aria-hidden="true" /> {s.zone}
        </span>
      ),
    },
    { id: 'top', header: 'Top', unit: u, kind: 'number', digits: 1, value: (s) => s.top },
    { id: 'base', header: 'Base', unit: u, kind: 'number', digits: 1, value: (s) => s.base, hiddenByDefault: true },
    { id: 'gross', header: 'Gross', unit: u, kind: 'number', digits: 2, value: (s) => s.gross.thickness.md },
    { id: 'netReservoir', header: 'Net res.', unit: u, kind: 'number', digits: 2, value: (s) => s.netReservoir.thickness.md },
    { id: 'netPay', header: 'Net pay', unit: u, kind: 'number', digits: 2, value: (s) => s.netPay.thickness.md },
    { id: 'ntg', header: 'N/G', kind: 'number', digits: 3, value: (s) => s.netToGross },
    { id: 'phi', header: 'Porosity', unit: 'v/v', kind: 'number', digits: 3, value: (s) => s.netPay.meanPhi },
    { id: 'sw', header: 'Sw', unit: 'v/v', kind: 'number', digits: 3, value: (s) => s.netPay.meanSw },
    { id: 'vsh', header: 'Vsh', unit: 'v/v', kind: 'number', digits: 3, value: (s) => s.netPay.meanVsh },
    { id: 'phiH', header: 'Phi-h', unit: u, kind: 'number', digits: 3, value: (s) => s.netPay.phiH.md },
    { id: 'hcpt', header: 'HCPT', unit: u, kind: 'number', digits: 3, value: (s) => s.netPay.hcpt.md },
    { id: 'payToGross', header: 'Pay/gross', kind: 'number', digits: 3, value: (s) => s.payToGross, hiddenByDefault: true },
    { id: 'grossPhi', header: 'Gross porosity', unit: 'v/v', kind: 'number', digits: 3, value: (s) => s.gross.meanPhi, hiddenByDefault: true },
    { id: 'nullThickness', header: 'Undetermined', unit: u, kind: 'number', digits: 2, value: (s) => s.nullThickness, hiddenByDefault: true },
  ];
  if (survey) {
    cols.push(
      { id: 'grossTvd', header: 'Gross TVD', unit: u, kind: 'number', digits: 2, value: (s) => s.gross.thickness.tvd, hiddenByDefault: true },
      { id: 'netPayTvd', header: 'Net pay TVD', unit: u, kind: 'number', digits: 2, value: (s) => s.netPay.thickness.tvd },
      { id: 'netPayTvt', header: 'Net pay TVT', unit: u, kind: 'number', digits: 2, value: (s) => s.netPay.thickness.tvt, hiddenByDefault: true },
      { id: 'phiHTvd', header: 'Phi-h TVD', unit: u, kind: 'number', digits: 3, value: (s) => s.netPay.phiH.tvd, hiddenByDefault: true },
    );
  }
  return cols;
}
