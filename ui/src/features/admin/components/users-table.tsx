import { Badge, Button, Flex, Table, Text } from '@radix-ui/themes';
import {
  createColumnHelper,
  createSortedRowModel,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  tableFeatures,
  useTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { SortableHeaderCell } from '../../../components/sortable-header-cell';
import type { UserAccount } from '../../../types/admin';
import { useUpdateUser } from '../api/update-user';
import { EditUserDialog } from './edit-user-dialog';

const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
});

type Features = typeof features;

const helper = createColumnHelper<Features, UserAccount>();

function buildColumns(currentUserId: string) {
  return helper.columns([
    helper.accessor('name', { header: 'Name', sortFn: 'alphanumeric', cell: (info) => <Text weight="medium">{info.getValue()}</Text> }),
    helper.accessor('email', { header: 'E-mail', sortFn: 'alphanumeric', cell: (info) => <span className="mono">{info.getValue()}</span> }),
    helper.accessor((row) => row.memberships.length, {
      id: 'assets',
      header: 'Assets and roles',
      sortFn: 'basic',
      cell: (info) => {
        const user = info.row.original;
        if (user.isAdmin && !user.memberships.length) return <Text color="gray">every asset, as admin</Text>;
        if (!user.memberships.length) return <Text color="gray">none yet</Text>;
        return (
          <ul className="plain-list" aria-label={`Assets of ${user.name}`}>
            {user.memberships.map((m) => (
              <li key={m.assetId}>
                {m.assetName} <Text color="gray">· {m.role}</Text>
              </li>
            ))}
          </ul>
        );
      },
    }),
    helper.accessor((row) => (row.isAdmin ? 1 : 0), {
      id: 'isAdmin',
      header: 'Organisation admin',
      sortFn: 'basic',
      cell: (info) => <AdminToggle user={info.row.original} isSelf={info.row.original.id === currentUserId} />,
    }),
    helper.display({ id: 'edit', header: () => <span className="visually-hidden">Edit</span>, cell: (info) => <EditUserDialog user={info.row.original} /> }),
  ]);
}

export interface UsersTableProps {
  users: UserAccount[];
  /** The signed-in admin (their row says "you"). */
  currentUserId: string;
}

/** The organisation's accounts: who they are, which assets they hold a role in, the admin flag (which can be switched), and an edit dialog (name, password reset). */
export function UsersTable({ users, currentUserId }: UsersTableProps) {
  const columns = useMemo(() => buildColumns(currentUserId), [currentUserId]);
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const table = useTable({ features, columns, data: users, getRowId: (row) => row.id, state: { sorting }, onSortingChange: setSorting });

  return (
    <Table.Root variant="surface" size="2">
      <caption className="visually-hidden">People</caption>
      <Table.Header>
        {table.getHeaderGroups().map((group) => (
          <Table.Row key={group.id}>
            {group.headers.map((header) =>
              header.column.getCanSort() ? (
                <SortableHeaderCell key={header.id} sorted={header.column.getIsSorted()} onToggle={header.column.getToggleSortingHandler()} placeholder={header.isPlaceholder}>
                  <table.FlexRender header={header} />
                </SortableHeaderCell>
              ) : (
                <Table.ColumnHeaderCell key={header.id}>
                  <table.FlexRender header={header} />
                </Table.ColumnHeaderCell>
              ),
            )}
          </Table.Row>
        ))}
      </Table.Header>
      <Table.Body>
        {table.getRowModel().rows.map((row) => (
          <Table.Row key={row.id}>
            {row.getAllCells().map((cell) => (
              <Table.Cell key={cell.id}>
                <table.FlexRender cell={cell} />
              </Table.Cell>
            ))}
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}

/** The admin badge and the button that grants or withdraws it; the server refuses to withdraw the last admin. */
function AdminToggle({ user, isSelf }: { user: UserAccount; isSelf: boolean }) {
  const update = useUpdateUser();
  return (
    <Flex direction="column" gap="1" align="start">
      <Flex gap="2" align="center">
        {user.isAdmin ? (
          <Badge color="jade" variant="soft">
            admin{isSelf ? ' (you)' : ''}
          </Badge>
        ) : (
          <Text color="gray">{isSelf ? 'you' : 'no'}</Text>
        )}
        <Button
          size="1"
          variant="ghost"
          loading={update.isPending}
          aria-label={user.isAdmin ? `Withdraw admin from ${user.name}` : `Make ${user.name} an admin`}
          onClick={() => update.mutate({ userId: user.id, isAdmin: !user.isAdmin })}
        >
          {user.isAdmin ? 'Withdraw' : 'Make admin'}
        </Button>
      </Flex>
      {update.error ? (
        <Text size="1" color="tomato" role="alert">
          {update.error.message}
        </Text>
      ) : null}
    </Flex>
  );
}
