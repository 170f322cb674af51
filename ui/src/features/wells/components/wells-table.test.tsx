import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { FakeXhr } from '../../../test/fake-xhr';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { WellRow } from '../../../types/api';
import { WellsTable } from './wells-table';

function well(id: string, name: string, curveCount: number, top: number | null): WellRow {
  return {
    id,
    name,
    uwi: `UWI-${id}`,
    logRunCount: top === null ? 0 : 1,
    curveCount,
    top,
    base: top === null ? null : top + 250,
    depthUnit: top === null ? null : 'ft',
    logRuns: [],
  };
}

const wells = [well('w2', 'Heron-2', 4, 5100), well('w1', 'Heron-1', 9, 4800), well('w3', 'Heron-3', 6, null)];

/** Well names in the order the table shows them. */
function shownOrder(): string[] {
  const table = screen.getByRole('table', { name: 'Wells' });
  return within(table)
    .getAllByRole('link')
    .map((link) => link.textContent ?? '');
}

describe('WellsTable', () => {
  beforeEach(() => {
    FakeXhr.requests = [];
    setToken('t-1');
  });
  afterEach(() => vi.unstubAllGlobals());

  it('lists the wells by name with their UWI, curve count and depth range with unit', () => {
    renderWithProviders(<WellsTable assetId="a1" wells={wells} canUpload={false} />);
    expect(shownOrder()).toEqual(['Heron-1', 'Heron-2', 'Heron-3']);
    const row = screen.getByRole('link', { name: 'Heron-1' }).closest('tr')!;
    expect(row.textContent).toContain('UWI-w1');
    expect(row.textContent).toContain('4,800 – 5,050 ft');
    expect(screen.getByRole('link', { name: 'Heron-1' }).getAttribute('href')).toBe('/assets/a1/wells/w1');
  });

  it('sorts by a column when its header is clicked, and reverses on the second click', () => {
    renderWithProviders(<WellsTable assetId="a1" wells={wells} canUpload={false} />);
    const header = screen.getByRole('columnheader', { name: 'Curves' });
    fireEvent.click(within(header).getByRole('button', { name: 'Curves' }));
    const first = header.getAttribute('aria-sort');
    const ascending = ['Heron-2', 'Heron-3', 'Heron-1']; // 4, 6, 9 curves
    expect(shownOrder()).toEqual(first === 'ascending' ? ascending : [...ascending].reverse());
    fireEvent.click(within(header).getByRole('button', { name: 'Curves' }));
    expect(header.getAttribute('aria-sort')).toBe(first === 'ascending' ? 'descending' : 'ascending');
    expect(shownOrder()).toEqual(first === 'ascending' ? [...ascending].reverse() : ascending);
  });

  it('offers no upload control to a role that may not load files', () => {
    renderWithProviders(<WellsTable assetId="a1" wells={wells} canUpload={false} />);
    expect(screen.queryByLabelText('LAS files for Heron-1')).toBeNull();
  });

  it('uploads the chosen LAS files with progress, then lists each file result with its diagnostics', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(200, wells)));
    renderWithProviders(<WellsTable assetId="a1" wells={wells} canUpload />);

    const input = screen.getByLabelText('LAS files for Heron-1') as HTMLInputElement;
    expect(input.multiple).toBe(true);
    const files = [new File(['~V\n'], 'h1-main.las'), new File(['~V\n'], 'h1-repeat.las')];
    fireEvent.change(input, { target: { files } });

    await waitFor(() => expect(FakeXhr.requests).toHaveLength(1));
    const request = FakeXhr.requests[0];
    expect(request.method).toBe('POST');
    expect(request.url).toBe('/api/assets/a1/wells/w1/log-runs');
    expect(request.headers.Authorization).toBe('Bearer t-1');
    expect((request.body as FormData).getAll('files').map((f) => (f as File).name)).toEqual(['h1-main.las', 'h1-repeat.las']);

    act(() => request.progress(40, 100));
    const bar = await screen.findByRole('progressbar', { name: 'Upload progress for Heron-1' });
    expect(bar.getAttribute('aria-valuenow')).toBe('40');

    act(() =>
      request.respond(201, {
        results: [
          { fileName: 'h1-main.las', status: 'stored', logRunId: 'r9', diagnostics: [{ severity: 'warning', line: 31, message: 'STEP does not match the depth increments' }] },
          { fileName: 'h1-repeat.las', status: 'duplicate', message: 'Already stored for this well', diagnostics: [] },
        ],
      }),
    );

    const results = await screen.findByRole('list', { name: 'Upload results for Heron-1' });
    expect(within(results).getByText('stored')).toBeTruthy();
    expect(within(results).getByText('duplicate')).toBeTruthy();
    expect(within(results).getByText('Already stored for this well')).toBeTruthy();
    const diagnostics = within(results).getByRole('list', { name: 'Diagnostics for h1-main.las' });
    expect(diagnostics.textContent).toContain('line 31');
    expect(diagnostics.textContent).toContain('STEP does not match the depth increments');
    expect(screen.queryByRole('progressbar', { name: 'Upload progress for Heron-1' })).toBeNull();
  });

  it('uploads LAS files dropped on the well\'s drop zone', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(200, wells)));
    renderWithProviders(<WellsTable assetId="a1" wells={wells} canUpload />);

    const zone = screen.getByRole('group', { name: 'Drop zone for Heron-2' });
    const dropped = new File(['~V\n'], 'h2.las');
    fireEvent.dragOver(zone, { dataTransfer: { types: ['Files'], files: [dropped] } });
    fireEvent.drop(zone, { dataTransfer: { types: ['Files'], files: [dropped] } });

    await waitFor(() => expect(FakeXhr.requests).toHaveLength(1));
    expect(FakeXhr.requests[0].url).toBe('/api/assets/a1/wells/w2/log-runs');
    expect((FakeXhr.requests[0].body as FormData).getAll('files').map((f) => (f as File).name)).toEqual(['h2.las']);
  });

  it('shows the per-file reasons when the server rejects every file (400 with results)', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(200, wells)));
    renderWithProviders(<WellsTable assetId="a1" wells={wells} canUpload />);

    fireEvent.change(screen.getByLabelText('LAS files for Heron-2'), { target: { files: [new File(['x'], 'bad.las')] } });
    await waitFor(() => expect(FakeXhr.requests).toHaveLength(1));
    act(() =>
      FakeXhr.requests[0].respond(400, {
        results: [{ fileName: 'bad.las', status: 'rejected', message: 'No ~A section', line: 42, diagnostics: [] }],
      }),
    );

    const results = await screen.findByRole('list', { name: 'Upload results for Heron-2' });
    expect(within(results).getByText('rejected')).toBeTruthy();
    expect(results.textContent).toContain('Line 42: No ~A section');
  });

  it("shows the server's message when the upload itself is refused (403)", async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(200, wells)));
    renderWithProviders(<WellsTable assetId="a1" wells={wells} canUpload />);

    fireEvent.change(screen.getByLabelText('LAS files for Heron-3'), { target: { files: [new File(['x'], 'a.las')] } });
    await waitFor(() => expect(FakeXhr.requests).toHaveLength(1));
    act(() => FakeXhr.requests[0].respond(403, { statusCode: 403, message: 'Only petrophysicists and admins load LAS files', error: 'Forbidden' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe('Upload failed: Only petrophysicists and admins load LAS files');
    await waitFor(() => expect(screen.getByLabelText('LAS files for Heron-3')).toHaveProperty('disabled', false));
  });
});
