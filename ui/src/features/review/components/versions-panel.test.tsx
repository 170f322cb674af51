import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { InterpretationDto, ReviewStatus } from '../../../types/workbench';
import { VersionsPanel } from './versions-panel';

function version(n: number, status: ReviewStatus, comment: string | null = null): InterpretationDto {
  return {
    id: `i${n}`,
    wellId: 'w1',
    version: n,
    status,
    inputs: {},
    summaries: [],
    warnings: [],
    createdBy: { id: 'u1', name: 'Petra Field' },
    submittedAt: status === 'draft' ? null : '2026-11-30T10:00:00Z',
    reviewedAt: null,
    reviewedBy: null,
    reviewComment: comment,
    updatedAt: '2026-11-30T10:00:00Z',
  };
}

/** A fake server: GET lists the versions, POST .../:action answers with the changed version. */
function serve(list: InterpretationDto[]) {
  const calls: { method: string; url: string; body: unknown }[] = [];
  const fetch = vi.fn(async (url: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    const body = init?.body ? JSON.parse(String(init.body)) : undefined;
    calls.push({ method, url, body });
    if (method === 'GET') return jsonResponse(200, list);
    const action = url.split('/').pop();
    if (action === 'return' && !body?.comment) return jsonResponse(400, { statusCode: 400, message: 'comment is required', error: 'Bad Request' });
    const next = action === 'submit' ? 'submitted' : action === 'approve' ? 'approved' : 'returned';
    list[0] = { ...list[0], status: next as ReviewStatus, reviewComment: body?.comment ?? null };
    return jsonResponse(200, list[0]);
  });
  vi.stubGlobal('fetch', fetch);
  return calls;
}

describe('VersionsPanel', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('lets the petrophysicist submit the latest draft, then shows it waiting for review', async () => {
    const calls = serve([version(2, 'draft'), version(1, 'approved')]);
    renderWithProviders(<VersionsPanel assetId="a1" wellId="w1" role="petrophysicist" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Submit for review' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.url.endsWith('/interpretations/i2/submit'))).toBe(true));
    await screen.findByText('Waiting for a reviewer. Edits are locked until it is approved or returned.');
    expect(screen.queryByRole('button', { name: 'Approve' })).toBeNull();
  });

  it('offers no review buttons to the author and no submit button to the reviewer', async () => {
    serve([version(3, 'submitted')]);
    const { unmount } = renderWithProviders(<VersionsPanel assetId="a1" wellId="w1" role="petrophysicist" />);
    await screen.findByText(/Waiting for a reviewer/);
    expect(screen.queryByRole('button', { name: 'Approve' })).toBeNull();
    unmount();
    serve([version(3, 'draft')]);
    renderWithProviders(<VersionsPanel assetId="a1" wellId="w1" role="reviewer" />);
    await screen.findByText('v3');
    expect(screen.queryByRole('button', { name: 'Submit for review' })).toBeNull();
  });

  it('asks the reviewer for a comment before returning, then returns with it', async () => {
    const calls = serve([version(2, 'submitted')]);
    renderWithProviders(<VersionsPanel assetId="a1" wellId="w1" role="reviewer" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Return' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Comment is required to return a version: say what to change.');
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
    fireEvent.change(screen.getByRole('textbox', { name: /Review comment/ }), { target: { value: 'Check Rw in the lower sand' } });
    fireEvent.click(screen.getByRole('button', { name: 'Return' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ comment: 'Check Rw in the lower sand' }));
    expect(calls.find((c) => c.method === 'POST')?.url).toMatch(/\/interpretations\/i2\/return$/);
  });

  it('approves with an optional comment', async () => {
    const calls = serve([version(2, 'submitted')]);
    renderWithProviders(<VersionsPanel assetId="a1" wellId="w1" role="admin" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Approve' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.url).toMatch(/\/interpretations\/i2\/approve$/));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({});
  });
});
