import { Badge, Button, Callout, Flex, IconButton, Table, Text, TextField } from '@radix-ui/themes';
import { useEffect, useState } from 'react';
import { FORMATION_PALETTE, formationColour } from '../../../lib/palette';
import type { Cutoffs, FormationDto, RecomputedWell } from '../../../types/workbench';
import { useCreateFormation } from '../api/create-formation';
import { usePutCutoffs } from '../api/put-cutoffs';
import { useUpdateFormation } from '../api/update-formation';

export const LITHOLOGIES = { sandstone: 'Sandstone', shaly_sand: 'Shaly sand', limestone: 'Limestone', dolomite: 'Dolomite' } as const;

export interface FormationsManagerProps {
  assetId: string;
  formations: readonly FormationDto[];
  canEdit: boolean;
}

/**
 * The asset's formation names, in stratigraphic order, each with a colour from Poreline's
 * palette, a lithology (for parameter defaults) and its cutoffs, which apply in every well.
 * Changing cutoffs here recomputes the draft interpretation of every well that has the formation.
 */
export function FormationsManager({ assetId, formations, canEdit }: FormationsManagerProps) {
  const ordered = [...formations].sort((a, b) => a.ordinal - b.ordinal);
  const update = useUpdateFormation(assetId);
  const [recomputed, setRecomputed] = useState<{ formation: string; rows: RecomputedWell[] } | null>(null);

  // The server moves a formation to a position and renumbers the others (refusing an order
  // that would put any well's tops out of depth order).
  const move = (i: number, dir: -1 | 1) => {
    const a = ordered[i];
    if (!a || !ordered[i + dir]) return;
    update.mutate({ formationId: a.id, input: { ordinal: i + 1 + dir } });
  };

  return (
    <Flex direction="column" gap="4">
      <Table.Root variant="surface" size="1">
        <caption className="visually-hidden">Formations</caption>
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Order</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Formation</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Lithology</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Vsh max</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Porosity min</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Sw max</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Perm. min (mD)</Table.ColumnHeaderCell>
            {canEdit ? <Table.ColumnHeaderCell>
              <span className="visually-hidden">Save</span>
            </Table.ColumnHeaderCell> : null}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {ordered.length === 0 ? (
            <Table.Row>
              <Table.Cell colSpan={8}>
                <Text color="gray">No formations yet.</Text>
              </Table.Cell>
            </Table.Row>
          ) : null}
          {ordered.map((f, i) => (
            <FormationRow
              key={f.id}
              assetId={assetId}
              formation={f}
              canEdit={canEdit}
              first={i === 0}
              last={i === ordered.length - 1}
              onMove={(dir) => move(i, dir)}
              onRecomputed={(rows) => setRecomputed({ formation: f.name, rows })}
            />
          ))}
        </Table.Body>
      </Table.Root>
      {update.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>{update.error.message}</Callout.Text>
        </Callout.Root>
      ) : null}
      {recomputed ? <RecomputedList formation={recomputed.formation} rows={recomputed.rows} /> : null}
      {canEdit ? <NewFormation assetId={assetId} nextIndex={ordered.length} nextOrdinal={(ordered.at(-1)?.ordinal ?? 0) + 1} /> : null}
    </Flex>
  );
}

interface RowProps {
  assetId: string;
  formation: FormationDto;
  canEdit: boolean;
  first: boolean;
  last: boolean;
  onMove: (dir: -1 | 1) => void;
  onRecomputed: (rows: RecomputedWell[]) => void;
}

type CutoffText = Record<keyof Cutoffs, string>;

const cutoffText = (c: Cutoffs): CutoffText => ({
  vshMax: String(c.vshMax),
  phiMin: String(c.phiMin),
  swMax: String(c.swMax),
  permMin: c.permMin === null ? '' : String(c.permMin),
});

function FormationRow({ assetId, formation: f, canEdit, first, last, onMove, onRecomputed }: RowProps) {
  const update = useUpdateFormation(assetId);
  const putCutoffs = usePutCutoffs(assetId);
  const [name, setName] = useState(f.name);
  const [colour, setColour] = useState(f.colour);
  const [lithology, setLithology] = useState(f.lithology);
  const [text, setText] = useState<CutoffText>(cutoffText(f.cutoffs));
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setName(f.name);
    setColour(f.colour);
    setLithology(f.lithology);
    setText(cutoffText(f.cutoffs));
  }, [f]);

  const parsed = (): Cutoffs | string => {
    const out: Partial<Cutoffs> = {};
    for (const [k, label] of [
      ['vshMax', 'Vsh max'],
      ['phiMin', 'Porosity min'],
      ['swMax', 'Sw max'],
    ] as const) {
      const v = Number(text[k]);
      if (text[k].trim() === '' || !Number.isFinite(v) || v < 0 || v > 1) return `${label} of ${f.name} must be a fraction between 0 and 1`;
      out[k] = v;
    }
    if (text.permMin.trim() === '') out.permMin = null;
    else {
      const p = Number(text.permMin);
      if (!Number.isFinite(p) || p < 0) return `Permeability min of ${f.name} must be 0 or more (or empty)`;
      out.permMin = p;
    }
    return out as Cutoffs;
  };
  const identityChanged = name !== f.name || colour !== f.colour || lithology !== f.lithology;
  const c = parsed();
  const stored = cutoffText(f.cutoffs);
  // Typed text differs from the stored cutoffs (valid or not: Save then says what is wrong).
  const cutoffsEdited = (Object.keys(stored) as (keyof Cutoffs)[]).some((k) => text[k].trim() !== stored[k]);
  const cutoffsChanged =
    typeof c !== 'string' && JSON.stringify(c) !== JSON.stringify({ vshMax: f.cutoffs.vshMax, phiMin: f.cutoffs.phiMin, swMax: f.cutoffs.swMax, permMin: f.cutoffs.permMin ?? null });

  const save = async () => {
    setError(null);
    if (typeof c === 'string') return setError(c);
    if (!name.trim()) return setError('Formation name is required');
    try {
      if (identityChanged) await update.mutateAsync({ formationId: f.id, input: { name: name.trim(), colour, lithology } });
      if (cutoffsChanged) {
        const res = await putCutoffs.mutateAsync({ formationId: f.id, cutoffs: c });
        onRecomputed(res.recomputed);
      }
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    }
  };
  const cutoffInput = (k: keyof Cutoffs, label: string) => (
    <input
      className="number-input number-input--narrow"
      inputMode="decimal"
      aria-label={`${label} of ${f.name}`}
      value={text[k]}
      disabled={!canEdit}
      onChange={(e) => {
        const v = e.currentTarget.value;
        setText((t) => ({ ...t, [k]: v }));
      }}
    />
  );

  return (
    <Table.Row>
      <Table.Cell>
        <Flex gap="1" align="center">
          <Text size="1" color="gray">
            {f.ordinal}
          </Text>
          {canEdit ? (
            <>
              <IconButton size="1" variant="ghost" aria-label={`Move ${f.name} up`} disabled={first} onClick={() => onMove(-1)}>
                ↑
              </IconButton>
              <IconButton size="1" variant="ghost" aria-label={`Move ${f.name} down`} disabled={last} onClick={() => onMove(1)}>
                ↓
              </IconButton>
            </>
          ) : null}
        </Flex>
      </Table.Cell>
      <Table.RowHeaderCell>
        <Flex direction="column" gap="1">
          {canEdit ? (
            <TextField.Root size="1" aria-label={`Name of ${f.name}`} value={name} onChange={(e) => setName(e.currentTarget.value)} />
          ) : (
            <Text weight="medium">{f.name}</Text>
          )}
          <ColourPicker value={colour} onChange={setColour} label={`Colour of ${f.name}`} disabled={!canEdit} />
          {error ? (
            <Text size="1" color="tomato" role="alert">
              {error}
            </Text>
          ) : null}
        </Flex>
      </Table.RowHeaderCell>
      <Table.Cell>
        <select className="native-select" aria-label={`Lithology of ${f.name}`} value={lithology} disabled={!canEdit} onChange={(e) => setLithology(e.currentTarget.value)}>
          {Object.entries(LITHOLOGIES).map(([k, label]) => (
            <option key={k} value={k}>
              {label}
            </option>
          ))}
        </select>
      </Table.Cell>
      <Table.Cell>{cutoffInput('vshMax', 'Vsh max')}</Table.Cell>
      <Table.Cell>{cutoffInput('phiMin', 'Porosity min')}</Table.Cell>
      <Table.Cell>{cutoffInput('swMax', 'Sw max')}</Table.Cell>
      <Table.Cell>{cutoffInput('permMin', 'Permeability min')}</Table.Cell>
      {canEdit ? (
        <Table.Cell>
          <Button size="1" onClick={save} disabled={!identityChanged && !cutoffsEdited} loading={update.isPending || putCutoffs.isPending} aria-label={`Save ${f.name}`}>
            Save
          </Button>
        </Table.Cell>
      ) : null}
    </Table.Row>
  );
}

/** Swatches of Poreline's formation palette as radio buttons. */
function ColourPicker({ value, onChange, label, disabled }: { value: string; onChange: (c: string) => void; label: string; disabled?: boolean }) {
  return (
    <div role="radiogroup" aria-label={label} className="colour-picker">
      {FORMATION_PALETTE.map((c) => (
        <button
          key={c}
          type="button"
          role="radio"
          aria-checked={c.toLowerCase() === value.toLowerCase()}
          aria-label={c}
          disabled={disabled}
          className="colour-picker__swatch"
          style={{ background: c }}
          onClick={() => onChange(c)}
        />
      ))}
    </div>
  );
}

function RecomputedList({ formation, rows }: { formation: string; rows: RecomputedWell[] }) {
  return (
    <Callout.Root color="jade" role="status">
      <Callout.Text>
        Cutoffs of {formation} stored.{' '}
        {rows.length === 0
          ? 'No well has an interpretation with this formation yet.'
          : rows.map((r) => (
              <span key={r.wellId} className="recomputed-item">
                {r.wellName}
                {r.version !== null ? ` v${r.version}` : ''}:{' '}
                {r.error ? (
                  <Badge size="1" color="tomato" variant="soft">
                    not recomputed: {r.error}
                  </Badge>
                ) : r.version === null ? (
                  <Badge size="1" variant="soft" color="gray">
                    no version yet
                  </Badge>
                ) : r.changed || r.recomputed ? (
                  <>
                    net pay {fmt(r.netPayBefore)} → {fmt(r.netPayAfter)}
                  </>
                ) : (
                  <Badge size="1" variant="soft">
                    {r.status}, left as it is
                  </Badge>
                )}
                {'; '}
              </span>
            ))}
      </Callout.Text>
    </Callout.Root>
  );
}

const fmt = (v: number | null) => (v === null ? '–' : String(Number(v.toFixed(2))));

function NewFormation({ assetId, nextIndex, nextOrdinal }: { assetId: string; nextIndex: number; nextOrdinal: number }) {
  const create = useCreateFormation(assetId);
  const [name, setName] = useState('');
  const [lithology, setLithology] = useState<string>('sandstone');
  const [colour, setColour] = useState(formationColour(nextIndex));
  const [error, setError] = useState<string | null>(null);
  useEffect(() => setColour(formationColour(nextIndex)), [nextIndex]);
  return (
    <form
      aria-label="New formation"
      className="new-formation"
      onSubmit={async (e) => {
        e.preventDefault();
        setError(null);
        if (!name.trim()) return setError('Formation name is required');
        try {
          await create.mutateAsync({ name: name.trim(), colour, lithology, ordinal: nextOrdinal });
          setName('');
        } catch (err) {
          setError(err instanceof Error ? err.message : String(err));
        }
      }}
    >
      <Flex gap="3" align="end" wrap="wrap">
        <label className="zp-field">
          <span>New formation name</span>
          <TextField.Root value={name} onChange={(e) => setName(e.currentTarget.value)} />
        </label>
        <label className="zp-field">
          <span>Lithology</span>
          <select className="native-select" value={lithology} onChange={(e) => setLithology(e.currentTarget.value)}>
            {Object.entries(LITHOLOGIES).map(([k, label]) => (
              <option key={k} value={k}>
                {label}
              </option>
            ))}
          </select>
        </label>
        <ColourPicker value={colour} onChange={setColour} label="Colour of the new formation" />
        <Button type="submit" loading={create.isPending}>
          Add formation
        </Button>
      </Flex>
      {error ? (
        <Text size="1" color="tomato" role="alert">
          {error}
        </Text>
      ) : null}
    </form>
  );
}
