import { Button, Flex, Table, Text, TextField } from '@radix-ui/themes';
import {
  columnFilteringFeature,
  columnVisibilityFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  tableFeatures,
  useTable,
  type ColumnVisibilityState,
  type SortingState,
} from '@tanstack/react-table';
import { useId, useMemo, useState, type ReactNode } from 'react';
import { SortableHeaderCell } from './sortable-header-cell';

/**
 * A summary table with sorting (click a header), a text filter over the text columns and a
 * column chooser, on TanStack Table 9. Used for zone summaries of a well (live) and of a
 * formation across wells.
 */

export interface SummaryColumn<T> {
  id: string;
  header: string;
  /** Shown under the header (units). */
  unit?: string;
  kind: 'number' | 'text';
  value: (row: T) => number | string | null | undefined;
  /** Decimal places of number columns. */
  digits?: number;
  /** Custom cell content (the value still drives sort and filter). */
  cell?: (row: T) => ReactNode;
  /** Hidden until chosen in the column chooser. */
  hiddenByDefault?: boolean;
}

const features = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  columnVisibilityFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
  filterFns: { includesString: filterFn_includesString },
});

type Row = Record<string, unknown>;

export interface SummaryTableProps<T> {
  /** Accessible name of the table (its caption). */
  name: string;
  rows: readonly T[];
  columns: readonly SummaryColumn<T>[];
  rowId: (row: T) => string;
  /** Initial sort. */
  initialSort?: SortingState;
  emptyText?: string;
  /** Extra controls placed beside the filter box (export buttons...). */
  toolbar?: ReactNode;
  /** Shows the filter box and column chooser (default true). */
  controls?: boolean;
  footnote?: ReactNode;
}

function formatNumber(v: number | null | undefined, digits: number): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '–';
  return v.toFixed(digits);
}

export function SummaryTable<T>({ name, rows, columns, rowId, initialSort = [], emptyText = 'No rows.', toolbar, controls = true, footnote }: SummaryTableProps<T>) {
  const helper = useMemo(() => createColumnHelper<typeof features, T & Row>(), []);
  const tableColumns = useMemo(
    () =>
      helper.columns(
        columns.map((c) =>
          helper.accessor((row) => {
            const v = c.value(row);
            return v === null ? undefined : v;
          }, {
            id: c.id,
            header: c.header,
            sortFn: c.kind === 'number' ? 'basic' : 'alphanumeric',
            sortUndefined: 'last',
            enableGlobalFilter: c.kind === 'text',
            filterFn: 'includesString',
            cell: (info) => (c.cell ? c.cell(info.row.original) : c.kind === 'number' ? formatNumber(info.getValue() as number, c.digits ?? 2) : String(info.getValue() ?? '–')),
          }),
        ),
      ),
    [columns, helper],
  );
  const [sorting, setSorting] = useState<SortingState>(initialSort);
  const [globalFilter, setGlobalFilter] = useState('');
  const [chooser, setChooser] = useState(false);
  const uid = useId();
  const [columnVisibility, setColumnVisibility] = useState<ColumnVisibilityState>(() =>
    Object.fromEntries(columns.filter((c) => c.hiddenByDefault).map((c) => [c.id, false])),
  );
  const table = useTable({
    features,
    columns: tableColumns,
    data: rows as (T & Row)[],
    getRowId: (row) => rowId(row),
    state: { sorting, globalFilter, columnVisibility },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    onColumnVisibilityChange: setColumnVisibility,
    globalFilterFn: 'includesString',
  });
  const byId = new Map(columns.map((c) => [c.id, c]));
  const shown = table.getRowModel().rows;

  return (
    <Flex direction="column" gap="2">
      {controls || toolbar ? (
        <Flex gap="3" align="center" wrap="wrap" justify="between">
          {controls ? (
            <Flex gap="3" align="center" wrap="wrap">
              <TextField.Root
                size="2"
                placeholder="Filter rows…"
                aria-label={`Filter ${name}`}
                value={globalFilter}
                onChange={(e) => setGlobalFilter(e.currentTarget.value)}
              />
              <Button
                variant="soft"
                color="gray"
                size="2"
                aria-expanded={chooser}
                aria-controls={`${uid}-columns`}
                onClick={() => setChooser((c) => !c)}
              >
                Columns
              </Button>
            </Flex>
          ) : (
            <span />
          )}
          {toolbar ? <Flex gap="2" wrap="wrap">{toolbar}</Flex> : null}
        </Flex>
      ) : null}
      {controls && chooser ? (
        <fieldset id={`${uid}-columns`} className="column-chooser">
          <legend>Columns shown</legend>
          {table.getAllLeafColumns().map((column) => (
            <label key={column.id} className="column-chooser__item">
              <input type="checkbox" checked={column.getIsVisible()} onChange={(e) => column.toggleVisibility(e.currentTarget.checked)} />
              {byId.get(column.id)?.header ?? column.id}
            </label>
          ))}
        </fieldset>
      ) : null}
      <Table.Root variant="surface" size="1" className="summary-table">
        <caption className="visually-hidden">{name}</caption>
        <Table.Header>
          {table.getHeaderGroups().map((group) => (
            <Table.Row key={group.id}>
              {group.headers.map((header) => {
                const spec = byId.get(header.column.id);
                return (
                  <SortableHeaderCell
                    key={header.id}
                    sorted={header.column.getIsSorted()}
                    onToggle={header.column.getToggleSortingHandler()}
                    className={spec?.kind === 'number' ? 'summary-table__num' : undefined}
                  >
                    <span>
                      {spec?.header}
                      {spec?.unit ? <span className="summary-table__unit">{spec.unit}</span> : null}
                    </span>
                  </SortableHeaderCell>
                );
              })}
            </Table.Row>
          ))}
        </Table.Header>
        <Table.Body>
          {shown.length === 0 ? (
            <Table.Row>
              <Table.Cell colSpan={table.getVisibleLeafColumns().length}>
                <Text color="gray">{globalFilter ? 'No rows match the filter.' : emptyText}</Text>
              </Table.Cell>
            </Table.Row>
          ) : (
            shown.map((row) => (
              <Table.Row key={row.id}>
                {row.getVisibleCells().map((cell) => (
                  <Table.Cell key={cell.id} className={byId.get(cell.column.id)?.kind === 'number' ? 'summary-table__num' : 'summary-table__text'}>
                    <table.FlexRender cell={cell} />
                  </Table.Cell>
                ))}
              </Table.Row>
            ))
          )}
        </Table.Body>
      </Table.Root>
      {footnote ? (
        <Text size="1" color="gray">
          {footnote}
        </Text>
      ) : null}
    </Flex>
  );
}

