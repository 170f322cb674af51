import { Button, Callout, Flex, IconButton, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import type { FormationRef, TopsDraft } from '../hooks/use-tops-draft';

export interface TopsEditorProps {
  draft: TopsDraft;
  formations: readonly FormationRef[];
  depthUnit: string;
  canEdit: boolean;
  saving: boolean;
  error: string | null;
  onSave: () => void;
}

/**
 * Formation tops of the well (MD): typed in the table, or picked by clicking the depth view
 * after pressing "Pick" on a row. Tops must deepen in the asset's formation order.
 */
export function TopsEditor({ draft, formations, depthUnit, canEdit, saving, error, onSave }: TopsEditorProps) {
  const unused = formations.filter((f) => !draft.rows.some((r) => r.formationId === f.id));
  const [adding, setAdding] = useState('');
  const addId = unused.some((f) => f.id === adding) ? adding : (unused[0]?.id ?? '');
  const invalid = Object.keys(draft.errors).length > 0;

  if (!formations.length) {
    return <Text color="gray">This asset has no formations yet. Define them on the asset’s formations page first.</Text>;
  }

  return (
    <Flex direction="column" gap="3">
      <Table.Root size="1" variant="surface">
        <caption className="visually-hidden">Formation tops</caption>
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Formation</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Top MD ({depthUnit})</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>From</Table.ColumnHeaderCell>
            {canEdit ? <Table.ColumnHeaderCell>
              <span className="visually-hidden">Actions</span>
            </Table.ColumnHeaderCell> : null}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {draft.rows.length === 0 ? (
            <Table.Row>
              <Table.Cell colSpan={4}>
                <Text color="gray">No tops yet.</Text>
              </Table.Cell>
            </Table.Row>
          ) : null}
          {draft.rows.map((r) => {
            const f = formations.find((x) => x.id === r.formationId);
            const name = f?.name ?? r.formationId;
            const err = draft.errors[r.formationId];
            return (
              <Table.Row key={r.formationId} data-picking={draft.picking === r.formationId ? '' : undefined}>
                <Table.RowHeaderCell>
                  <Flex align="center" gap="2">
                    <span className="swatch" style={{ background: f?.colour }} aria-hidden="true" />
                    {name}
                  </Flex>
                </Table.RowHeaderCell>
                <Table.Cell>
                  <input
                    className="number-input number-input--narrow"
                    inputMode="decimal"
                    aria-label={`Top of ${name}`}
                    aria-invalid={err ? true : undefined}
                    value={r.md}
                    disabled={!canEdit}
                    onChange={(e) => draft.setMd(r.formationId, e.currentTarget.value)}
                  />
                  {err ? (
                    <Text as="div" size="1" color="tomato" role="alert">
                      {err}
                    </Text>
                  ) : null}
                </Table.Cell>
                <Table.Cell>
                  <Text size="1" color="gray">
                    {r.source === 'depth-view' ? 'depth view' : 'table'}
                  </Text>
                </Table.Cell>
                {canEdit ? (
                  <Table.Cell>
                    <Flex gap="1">
                      <Button
                        size="1"
                        variant={draft.picking === r.formationId ? 'solid' : 'soft'}
                        aria-pressed={draft.picking === r.formationId}
                        onClick={() => draft.setPicking(draft.picking === r.formationId ? null : r.formationId)}
                      >
                        {draft.picking === r.formationId ? 'Click the view…' : 'Pick'}
                      </Button>
                      <IconButton size="1" variant="ghost" color="gray" aria-label={`Remove top of ${name}`} onClick={() => draft.remove(r.formationId)}>
                        ✕
                      </IconButton>
                    </Flex>
                  </Table.Cell>
                ) : null}
              </Table.Row>
            );
          })}
        </Table.Body>
      </Table.Root>
      {canEdit && unused.length ? (
        <Flex gap="2" align="center" wrap="wrap">
          <label htmlFor="add-top-formation" className="zp-inline-label">
            Add a top for
          </label>
          <select id="add-top-formation" className="native-select" value={addId} onChange={(e) => setAdding(e.currentTarget.value)}>
            {unused.map((f) => (
              <option key={f.id} value={f.id}>
                {f.name}
              </option>
            ))}
          </select>
          <Button size="1" variant="soft" onClick={() => draft.setMd(addId, '')}>
            Add
          </Button>
          <Button
            size="1"
            variant="soft"
            onClick={() => {
              draft.setMd(addId, '');
              draft.setPicking(addId);
            }}
          >
            Add and pick on the view
          </Button>
        </Flex>
      ) : null}
      {draft.picking ? (
        <Text size="2" color="jade" role="status">
          Click the depth view at the top of {formations.find((f) => f.id === draft.picking)?.name}.
        </Text>
      ) : null}
      {error ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>{error}</Callout.Text>
        </Callout.Root>
      ) : null}
      {canEdit ? (
        <Flex gap="2">
          <Button onClick={onSave} disabled={!draft.dirty || invalid} loading={saving}>
            Save tops
          </Button>
          <Button variant="soft" color="gray" onClick={draft.reset} disabled={!draft.dirty}>
            Undo changes
          </Button>
        </Flex>
      ) : null}
    </Flex>
  );
}
