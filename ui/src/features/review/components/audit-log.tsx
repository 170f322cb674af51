import { Button, Callout, Code, Flex, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { formatDateTime } from '../../../lib/format';
import type { AuditEntry } from '../../../types/workbench';
import { useAuditLog } from '../api/audit-log';

const PAGE = 50;

const ENTITIES = ['', 'interpretation', 'formation', 'formation_cutoffs', 'well_tops', 'zone_parameters', 'curve_bindings', 'well_survey', 'well', 'log_run', 'reserves-case', 'production-series', 'asset', 'asset_member', 'demo-field'];

/** What changed between before and after: the top-level keys whose JSON differs. */
export function changedKeys(before: unknown, after: unknown): string[] {
  const obj = (x: unknown) => (x && typeof x === 'object' && !Array.isArray(x) ? (x as Record<string, unknown>) : null);
  const nothing = (x: unknown) => x === null || x === undefined;
  if (nothing(before) && nothing(after)) return [];
  // A creation (nothing before) or a deletion (nothing after) lists the other side's keys.
  const b = obj(before) ?? (nothing(before) ? {} : null);
  const a = obj(after) ?? (nothing(after) ? {} : null);
  if (!b || !a) return JSON.stringify(before) === JSON.stringify(after) ? [] : ['value'];
  const keys = new Set([...Object.keys(b), ...Object.keys(a)]);
  return [...keys].filter((k) => JSON.stringify(b[k]) !== JSON.stringify(a[k])).sort();
}

function short(v: unknown): string {
  if (v === undefined || v === null) return '–';
  const s = typeof v === 'string' ? v : JSON.stringify(v);
  return s.length > 80 ? `${s.slice(0, 77)}…` : s;
}

function Change({ entry }: { entry: AuditEntry }) {
  const keys = changedKeys(entry.before, entry.after);
  if (!keys.length) return <Text size="1" color="gray">–</Text>;
  const pick = (x: unknown, k: string) => (x && typeof x === 'object' && !Array.isArray(x) ? (x as Record<string, unknown>)[k] : x);
  return (
    <ul className="plain-list audit-change">
      {keys.slice(0, 6).map((k) => (
        <li key={k}>
          <Code size="1" variant="ghost">
            {k}
          </Code>{' '}
          <Text size="1" color="gray">
            {short(pick(entry.before, k))} → {short(pick(entry.after, k))}
          </Text>
        </li>
      ))}
      {keys.length > 6 ? (
        <li>
          <Text size="1" color="gray">
            and {keys.length - 6} more
          </Text>
        </li>
      ) : null}
    </ul>
  );
}

/** The asset's audit log: who changed what and when, with the values before and after. */
export function AuditLog({ assetId }: { assetId: string }) {
  const [entity, setEntity] = useState('');
  const [limit, setLimit] = useState(PAGE);
  const log = useAuditLog(assetId, { entity: entity || undefined, limit });
  return (
    <Flex direction="column" gap="3">
      <Flex gap="2" align="center">
        <label htmlFor="audit-entity" className="zp-inline-label">
          Show
        </label>
        <select
          id="audit-entity"
          className="native-select"
          value={entity}
          onChange={(e) => {
            setEntity(e.currentTarget.value);
            setLimit(PAGE);
          }}
        >
          {ENTITIES.map((e) => (
            <option key={e} value={e}>
              {e ? e.replace(/_/g, ' ') : 'every change'}
            </option>
          ))}
        </select>
      </Flex>
      {log.isPending ? (
        <Text color="gray">Loading the audit log…</Text>
      ) : log.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>The audit log could not be loaded: {log.error.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <Table.Root size="1" variant="surface">
          <caption className="visually-hidden">Audit log</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>When</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Who</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Action</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>What</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Change</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {log.data.length === 0 ? (
              <Table.Row>
                <Table.Cell colSpan={5}>
                  <Text color="gray">Nothing recorded yet.</Text>
                </Table.Cell>
              </Table.Row>
            ) : (
              log.data.map((e) => (
                <Table.Row key={e.id}>
                  <Table.Cell className="nowrap">
                    <Text size="1">{formatDateTime(e.at)}</Text>
                  </Table.Cell>
                  <Table.Cell>
                    <Text size="1">{e.user?.name ?? 'system'}</Text>
                  </Table.Cell>
                  <Table.Cell>
                    <Code size="1" variant="soft">
                      {e.action}
                    </Code>
                  </Table.Cell>
                  <Table.Cell>
                    <Text size="1">
                      {e.entity.replace(/_/g, ' ')}
                      {e.entityId ? <span className="mono"> {String(e.entityId).slice(0, 8)}</span> : null}
                    </Text>
                  </Table.Cell>
                  <Table.Cell>
                    <Change entry={e} />
                  </Table.Cell>
                </Table.Row>
              ))
            )}
          </Table.Body>
        </Table.Root>
      )}
      {log.data && log.data.length >= limit && limit < 1000 ? (
        <Button variant="soft" color="gray" onClick={() => setLimit((l) => Math.min(1000, l + 100))} loading={log.isFetching}>
          Show older entries
        </Button>
      ) : null}
    </Flex>
  );
}
