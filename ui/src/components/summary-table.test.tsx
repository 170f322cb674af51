import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../test/render';
import { SummaryTable, type SummaryColumn } from './summary-table';

interface Row {
  well: string;
  pay: number | null;
  phi: number;
}
const rows: Row[] = [
  { well: 'Heron-2', pay: 12.5, phi: 0.21 },
  { well: 'Heron-1', pay: 30, phi: 0.18 },
  { well: 'Kite-1', pay: null, phi: 0.09 },
];
const columns: SummaryColumn<Row>[] = [
  { id: 'well', header: 'Well', kind: 'text', value: (r) => r.well },
  { id: 'pay', header: 'Net pay', unit: 'ft', kind: 'number', digits: 1, value: (r) => r.pay },
  { id: 'phi', header: 'Porosity', kind: 'number', digits: 3, value: (r) => r.phi, hiddenByDefault: true },
];

const wells = () =>
  within(screen.getByRole('table', { name: 'Zone summary' }))
    .getAllByRole('row')
    .slice(1)
    .map((r) => within(r).getAllByRole('cell')[0].textContent);

describe('SummaryTable', () => {
  it('is a table named by its caption, numbers formatted, missing as an en dash, hidden columns left out', () => {
    renderWithProviders(<SummaryTable name="Zone summary" rows={rows} columns={columns} rowId={(r) => r.well} />);
    const table = screen.getByRole('table', { name: 'Zone summary' });
    expect(within(table).getByText('12.5')).toBeTruthy();
    expect(within(table).getByText('–')).toBeTruthy();
    expect(within(table).queryByRole('columnheader', { name: /Porosity/ })).toBeNull();
  });

  it('sorts numbers on a header click, missing values last both ways', () => {
    renderWithProviders(<SummaryTable name="Zone summary" rows={rows} columns={columns} rowId={(r) => r.well} />);
    const header = screen.getByRole('columnheader', { name: /Net pay/ });
    fireEvent.click(within(header).getByRole('button'));
    const first = header.getAttribute('aria-sort');
    const asc = ['Heron-2', 'Heron-1', 'Kite-1'];
    const desc = ['Heron-1', 'Heron-2', 'Kite-1'];
    expect(wells()).toEqual(first === 'ascending' ? asc : desc);
    fireEvent.click(within(header).getByRole('button'));
    expect(wells()).toEqual(first === 'ascending' ? desc : asc);
  });

  it('filters rows by the text columns', () => {
    renderWithProviders(<SummaryTable name="Zone summary" rows={rows} columns={columns} rowId={(r) => r.well} />);
    fireEvent.change(screen.getByRole('textbox', { name: 'Filter Zone summary' }), { target: { value: 'heron' } });
    expect(wells()).toHaveLength(2);
    fireEvent.change(screen.getByRole('textbox', { name: 'Filter Zone summary' }), { target: { value: 'zzz' } });
    expect(screen.getByText('No rows match the filter.')).toBeTruthy();
  });

  it('shows a hidden column once it is chosen in the column chooser', async () => {
    renderWithProviders(<SummaryTable name="Zone summary" rows={rows} columns={columns} rowId={(r) => r.well} />);
    fireEvent.click(screen.getByRole('button', { name: 'Columns' }));
    fireEvent.click(within(screen.getByRole('group', { name: 'Columns shown' })).getByRole('checkbox', { name: 'Porosity' }));
    await waitFor(() => expect(screen.getByRole('columnheader', { name: /Porosity/ })).toBeTruthy());
    expect(screen.getByText('0.210')).toBeTruthy();
  });
});
