import { Button, Table, Text } from '@radix-ui/themes';
import { formatDateTime } from '../../../lib/format';
import type { MailNotice } from '../../../types/mail';
import { MailStatusBadge } from './mail-status-badge';

export interface MailTableProps {
  notices: MailNotice[];
  selectedId: string | null;
  onSelect: (id: string) => void;
}

/** The organisation's e-mail notices, newest first. */
export function MailTable({ notices, selectedId, onSelect }: MailTableProps) {
  return (
    <Table.Root variant="surface" size="1">
      <caption className="visually-hidden">E-mail notices</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Written</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>To</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Subject</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Asset</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>
            <span className="visually-hidden">Open</span>
          </Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {notices.map((n) => (
          <Table.Row key={n.id} aria-current={n.id === selectedId ? 'true' : undefined}>
            <Table.Cell>
              <Text size="1">{formatDateTime(n.createdAt)}</Text>
            </Table.Cell>
            <Table.Cell>{n.to}</Table.Cell>
            <Table.RowHeaderCell>{n.subject.replace(/^\[Poreline\]\s*/, '')}</Table.RowHeaderCell>
            <Table.Cell>
              <Text color="gray">{n.assetName ?? '–'}</Text>
            </Table.Cell>
            <Table.Cell>
              <span title={n.error ?? undefined}>
                <MailStatusBadge notice={n} />
              </span>
            </Table.Cell>
            <Table.Cell>
              <Button size="1" variant={n.id === selectedId ? 'solid' : 'soft'} aria-label={`Read the notice to ${n.to}: ${n.subject}`} onClick={() => onSelect(n.id)}>
                Read
              </Button>
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
