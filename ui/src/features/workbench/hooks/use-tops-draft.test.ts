import { act, renderHook } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { TopDto } from '../../../types/workbench';
import { useTopsDraft } from './use-tops-draft';

const formations = [
  { id: 'f1', name: 'Upper Sand', ordinal: 1, colour: '#d9b26f' },
  { id: 'f2', name: 'Middle Shale', ordinal: 2, colour: '#8fb7a3' },
  { id: 'f3', name: 'Lower Sand', ordinal: 3, colour: '#c7917a' },
];
const stored: TopDto[] = [
  { formationId: 'f1', formationName: 'Upper Sand', colour: '#d9b26f', md: 5000, source: 'table' },
  { formationId: 'f2', formationName: 'Middle Shale', colour: '#8fb7a3', md: 5100, source: 'table' },
];

describe('useTopsDraft', () => {
  it('starts from the stored tops, not dirty, ordered by formation', () => {
    const { result } = renderHook(() => useTopsDraft(stored, formations));
    expect(result.current.rows.map((r) => r.formationId)).toEqual(['f1', 'f2']);
    expect(result.current.dirty).toBe(false);
    expect(result.current.errors).toEqual({});
  });

  it('reports a top that does not deepen in formation order, naming both formations', () => {
    const { result } = renderHook(() => useTopsDraft(stored, formations));
    act(() => result.current.setMd('f3', '5050'));
    expect(result.current.errors.f3).toBe('Top of Lower Sand must be deeper than the top of Middle Shale (5100)');
    act(() => result.current.setMd('f3', 'abc'));
    expect(result.current.errors.f3).toBe('Top of Lower Sand must be a number');
  });

  it('a click on the depth view while picking sets that top from the view and stops picking', () => {
    const { result } = renderHook(() => useTopsDraft(stored, formations));
    act(() => result.current.setPicking('f3'));
    act(() => result.current.applyPick(5230.4));
    expect(result.current.picking).toBeNull();
    expect(result.current.payload).toEqual([
      { formationId: 'f1', md: 5000, source: 'table' },
      { formationId: 'f2', md: 5100, source: 'table' },
      { formationId: 'f3', md: 5230.4, source: 'depth-view' },
    ]);
    expect(result.current.dirty).toBe(true);
  });
});
