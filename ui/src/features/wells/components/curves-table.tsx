import { Table, Text } from '@radix-ui/themes';
import { formatNumber, formatValue } from '../../../lib/format';
import type { Curve } from '../../../types/api';

export interface CurvesTableProps {
  fileName: string;
  curves: readonly Curve[];
}

/** A log run's curves as read from the file: mnemonic, unit, recognised class, null count, range. */
export function CurvesTable({ fileName, curves }: CurvesTableProps) {
  return (
    <Table.Root variant="surface" size="1">
      <caption className="visually-hidden">Curves of {fileName}</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Mnemonic</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Unit</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Class</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Nulls</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Min</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Max</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Description</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {curves.map((curve) => (
          <Table.Row key={curve.id}>
            <Table.RowHeaderCell className="mono">{curve.mnemonic}</Table.RowHeaderCell>
            <Table.Cell className="mono">{curve.unit || '–'}</Table.Cell>
            <Table.Cell>{curve.curveClass ?? <Text color="gray">not recognised</Text>}</Table.Cell>
            <Table.Cell justify="end">{formatNumber(curve.nullCount)}</Table.Cell>
            <Table.Cell justify="end">{formatValue(curve.min)}</Table.Cell>
            <Table.Cell justify="end">{formatValue(curve.max)}</Table.Cell>
            <Table.Cell>
              <Text color="gray">{curve.description || '–'}</Text>
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
