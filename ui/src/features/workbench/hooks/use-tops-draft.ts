import { useCallback, useEffect, useMemo, useState } from 'react';
import type { TopDto, TopSource } from '../../../types/workbench';
import type { TopInput } from '../api/tops';

export interface TopRow {
  formationId: string;
  md: string;
  source: TopSource;
}

export interface FormationRef {
  id: string;
  name: string;
  ordinal: number;
  colour: string;
}

const toRows = (tops: readonly TopDto[]): TopRow[] =>
  tops.map((t) => ({ formationId: t.formationId, md: String(t.md), source: t.source === 'depth-view' ? 'depth-view' : 'table' }));

/**
 * Editable copy of a well's tops, shared by the tops table and the depth view (a click on the
 * view sets the top of the formation being picked). Checks what the server checks: each MD a
 * number, tops deepening in formation order.
 */
export function useTopsDraft(stored: readonly TopDto[] | undefined, formations: readonly FormationRef[]) {
  const [rows, setRows] = useState<TopRow[]>(() => toRows(stored ?? []));
  const [picking, setPicking] = useState<string | null>(null);
  useEffect(() => setRows(toRows(stored ?? [])), [stored]);

  const setMd = useCallback((formationId: string, md: string, source: TopSource = 'table') => {
    setRows((rs) => {
      const i = rs.findIndex((r) => r.formationId === formationId);
      if (i < 0) return [...rs, { formationId, md, source }];
      const next = rs.slice();
      next[i] = { ...next[i], md, source };
      return next;
    });
  }, []);
  const remove = useCallback((formationId: string) => setRows((rs) => rs.filter((r) => r.formationId !== formationId)), []);
  /** A depth clicked on the view while picking: sets that formation's top and stops picking. */
  const applyPick = useCallback(
    (md: number) => {
      if (!picking) return;
      setMd(picking, String(md), 'depth-view');
      setPicking(null);
    },
    [picking, setMd],
  );

  const ordinal = useMemo(() => new Map(formations.map((f) => [f.id, f.ordinal])), [formations]);
  const sorted = useMemo(() => [...rows].sort((a, b) => (ordinal.get(a.formationId) ?? 0) - (ordinal.get(b.formationId) ?? 0)), [rows, ordinal]);

  const errors = useMemo(() => {
    const out: Record<string, string> = {};
    let prev: { name: string; md: number } | null = null;
    for (const r of sorted) {
      const name = formations.find((f) => f.id === r.formationId)?.name ?? r.formationId;
      const md = r.md.trim() === '' ? NaN : Number(r.md);
      if (!Number.isFinite(md)) {
        out[r.formationId] = `Top of ${name} must be a number`;
        continue;
      }
      if (prev && !(md > prev.md)) out[r.formationId] = `Top of ${name} must be deeper than the top of ${prev.name} (${prev.md})`;
      prev = { name, md };
    }
    return out;
  }, [sorted, formations]);

  const dirty = useMemo(() => {
    const a = toRows(stored ?? []);
    if (a.length !== rows.length) return true;
    return rows.some((r) => {
      const s = a.find((x) => x.formationId === r.formationId);
      return !s || Number(s.md) !== Number(r.md);
    });
  }, [rows, stored]);

  const payload: TopInput[] = sorted.map((r) => ({ formationId: r.formationId, md: Number(r.md), source: r.source }));
  return { rows: sorted, setMd, remove, picking, setPicking, applyPick, errors, dirty, payload, reset: () => setRows(toRows(stored ?? [])) };
}

export type TopsDraft = ReturnType<typeof useTopsDraft>;
