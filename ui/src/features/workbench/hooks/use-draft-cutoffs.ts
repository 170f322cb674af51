import { useCallback, useEffect, useMemo, useState } from 'react';
import type { Cutoffs } from '../../../types/workbench';

const same = (a: Cutoffs, b: Cutoffs) =>
  Math.abs(a.vshMax - b.vshMax) < 1e-12 && Math.abs(a.phiMin - b.phiMin) < 1e-12 && Math.abs(a.swMax - b.swMax) < 1e-12 && (a.permMin ?? null) === (b.permMin ?? null);

/**
 * The cutoffs being tuned, per formation name, starting from the stored ones; reset whenever
 * the stored ones change (after a save). `changed` lists the formations that differ.
 */
export function useDraftCutoffs(stored: Readonly<Record<string, Cutoffs>> | undefined) {
  const storedKey = JSON.stringify(stored ?? {});
  const [draft, setDraft] = useState<Record<string, Cutoffs>>(() => ({ ...(stored ?? {}) }));
  // eslint-disable-next-line react-hooks/exhaustive-deps
  useEffect(() => setDraft({ ...(stored ?? {}) }), [storedKey]);

  const set = useCallback((formation: string, field: keyof Cutoffs, value: number | null) => {
    setDraft((d) => {
      const current = d[formation];
      if (!current) return d;
      return { ...d, [formation]: { ...current, [field]: field === 'permMin' ? value : (value ?? current[field]) } };
    });
  }, []);

  const changed = useMemo(
    () => Object.keys(draft).filter((name) => stored?.[name] && !same(draft[name], stored[name])),
    [draft, stored],
  );
  const reset = useCallback(() => setDraft({ ...(stored ?? {}) }), [stored]);
  return { draft, set, changed, reset };
}
