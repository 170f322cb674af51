import { Flex, Table, Text } from '@radix-ui/themes';
import {
  createColumnHelper,
  createSortedRowModel,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  tableFeatures,
  useTable,
  type Row,
  type SortingState,
} from '@tanstack/react-table';
import { Fragment, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { SortableHeaderCell } from '../../../components/sortable-header-cell';
import { formatDepthRange } from '../../../lib/format';
import type { WellRow } from '../../../types/api';
import { useUploadLogRuns } from '../api/upload-log-runs';
import { LasDropZone } from './las-drop-zone';
import { UploadStatus } from './upload-status';

const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
});

type Features = typeof features;

const helper = createColumnHelper<Features, WellRow>();

function buildColumns(assetId: string) {
  return helper.columns([
    helper.accessor('name', {
      header: 'Well',
      sortFn: 'alphanumeric',
      cell: (info) => (
        <Link to={`/assets/${assetId}/wells/${info.row.original.id}`} className="strong-link">
          {info.getValue()}
        </Link>
      ),
    }),
    helper.accessor((row) => row.uwi || undefined, {
      id: 'uwi',
      header: 'UWI',
      sortFn: 'alphanumeric',
      sortUndefined: 'last',
      cell: (info) => <span className="mono">{info.getValue() ?? '–'}</span>,
    }),
    helper.accessor('logRunCount', {
      header: 'Log runs',
      sortFn: 'basic',
      cell: (info) => {
        const runs = info.row.original.logRuns;
        return (
          <Flex direction="column" gap="1">
            <Text>{info.getValue()}</Text>
            {runs.length ? (
              <ul className="plain-list run-names" aria-label={`Log runs of ${info.row.original.name}`}>
                {runs.map((run) => (
                  <li key={run.id}>
                    <Text size="1" color="gray" className="mono">
                      {run.fileName}
                    </Text>
                  </li>
                ))}
              </ul>
            ) : null}
          </Flex>
        );
      },
    }),
    helper.accessor('curveCount', { header: 'Curves', sortFn: 'basic' }),
    helper.accessor((row) => row.top ?? undefined, {
      id: 'depthRange',
      header: 'Depth range',
      sortFn: 'basic',
      sortUndefined: 'last',
      cell: (info) => {
        const well = info.row.original;
        return <span className="nowrap">{formatDepthRange(well.top, well.base, well.depthUnit)}</span>;
      },
    }),
  ]);
}

export interface WellsTableProps {
  assetId: string;
  wells: WellRow[];
  /** Shows the LAS upload control on each well (petrophysicist/admin). */
  canUpload: boolean;
}

/** The asset's wells with their log runs; every column sorts; each well can take LAS files. */
export function WellsTable({ assetId, wells, canUpload }: WellsTableProps) {
  const columns = useMemo(() => buildColumns(assetId), [assetId]);
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const table = useTable({
    features,
    columns,
    data: wells,
    getRowId: (row) => row.id,
    state: { sorting },
    onSortingChange: setSorting,
  });
  const columnCount = columns.length + (canUpload ? 1 : 0);

  return (
    <Table.Root variant="surface" size="2" className="wells-table">
      <caption className="visually-hidden">Wells</caption>
      <Table.Header>
        {table.getHeaderGroups().map((group) => (
          <Table.Row key={group.id}>
            {group.headers.map((header) => (
              <SortableHeaderCell key={header.id} sorted={header.column.getIsSorted()} onToggle={header.column.getToggleSortingHandler()} placeholder={header.isPlaceholder}>
                <table.FlexRender header={header} />
              </SortableHeaderCell>
            ))}
            {canUpload ? <Table.ColumnHeaderCell>Load LAS</Table.ColumnHeaderCell> : null}
          </Table.Row>
        ))}
      </Table.Header>
      <Table.Body>
        {table.getRowModel().rows.length === 0 ? (
          <Table.Row>
            <Table.Cell colSpan={columnCount}>
              <Text color="gray">No wells in this asset yet.</Text>
            </Table.Cell>
          </Table.Row>
        ) : (
          table.getRowModel().rows.map((row) => (
            <WellRowGroup key={row.id} assetId={assetId} row={row} canUpload={canUpload} columnCount={columnCount}>
              {row.getAllCells().map((cell) => (
                <Table.Cell key={cell.id}>
                  <table.FlexRender cell={cell} />
                </Table.Cell>
              ))}
            </WellRowGroup>
          ))
        )}
      </Table.Body>
    </Table.Root>
  );
}

interface WellRowGroupProps {
  assetId: string;
  row: Row<Features, WellRow>;
  canUpload: boolean;
  columnCount: number;
  children: React.ReactNode;
}

/** A well's row, plus a second row for upload progress and results once files were sent. */
function WellRowGroup({ assetId, row, canUpload, columnCount, children }: WellRowGroupProps) {
  const well = row.original;
  const upload = useUploadLogRuns(assetId, well.id);
  const [fileCount, setFileCount] = useState(0);
  const showStatus = canUpload && (upload.progress !== null || upload.error !== null || upload.data !== undefined);

  return (
    <Fragment>
      <Table.Row>
        {children}
        {canUpload ? (
          <Table.Cell>
            <LasDropZone
              wellName={well.name}
              disabled={upload.isPending}
              onFiles={(files) => {
                setFileCount(files.length);
                upload.mutate(files);
              }}
            />
          </Table.Cell>
        ) : null}
      </Table.Row>
      {showStatus ? (
        <Table.Row className="wells-table__status-row">
          <Table.Cell colSpan={columnCount}>
            <UploadStatus
              wellName={well.name}
              fileCount={fileCount}
              progress={upload.progress}
              error={upload.error}
              results={upload.data?.results}
            />
          </Table.Cell>
        </Table.Row>
      ) : null}
    </Fragment>
  );
}
