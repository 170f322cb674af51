import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setToken } from '../../../lib/auth-token';
import { jsonResponse, renderWithProviders } from '../../../test/render';
import type { MailNotice, MailNoticeDetail } from '../../../types/mail';
import { MailNoticePanel } from './mail-notice-panel';
import { MailTable } from './mail-table';

const notices: MailNotice[] = [
  { id: 'm2', createdAt: '2026-03-02T09:00:00Z', sentAt: null, status: 'failed', error: 'connect ECONNREFUSED 127.0.0.1:25', to: 'Sam Petro <sam@tern.test>', subject: '[Poreline] Returned: interpretation v2 of well T-1 (North Tern)', event: 'interpretation.returned', assetName: 'North Tern', caught: false },
  { id: 'm1', createdAt: '2026-03-01T09:00:00Z', sentAt: '2026-03-01T09:00:01Z', status: 'sent', error: null, to: 'Lee Rev <lee@tern.test>', subject: '[Poreline] Waiting for your review: interpretation v2 of well T-1 (North Tern)', event: 'interpretation.submitted', assetName: 'North Tern', caught: true },
];

function Harness() {
  const [selected, setSelected] = useState<string | null>(null);
  return (
    <>
      <MailTable notices={notices} selectedId={selected} onSelect={setSelected} />
      {selected ? <MailNoticePanel id={selected} /> : null}
    </>
  );
}

describe('MailTable and MailNoticePanel', () => {
  beforeEach(() => setToken('t-1'));
  afterEach(() => vi.unstubAllGlobals());

  it('lists the notices in the order given, with recipient, subject without the tag, asset and status', () => {
    renderWithProviders(<MailTable notices={notices} selectedId={null} onSelect={() => undefined} />);
    const rows = within(screen.getByRole('table', { name: 'E-mail notices' })).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getByRole('rowheader').textContent)).toEqual([
      'Returned: interpretation v2 of well T-1 (North Tern)',
      'Waiting for your review: interpretation v2 of well T-1 (North Tern)',
    ]);
    expect(within(rows[0]).getByText('not sent')).toBeTruthy();
    expect(within(rows[0]).getByTitle('connect ECONNREFUSED 127.0.0.1:25')).toBeTruthy();
    expect(within(rows[1]).getByText('caught here')).toBeTruthy();
  });

  it('Read loads the notice and shows its text, the refusal, and the raw message when the catcher has it', async () => {
    const detail = (n: MailNotice): MailNoticeDetail => ({ ...n, body: `Hello,\n\nbody of ${n.id}\n`, raw: n.caught ? `Message-ID: <${n.id}@x>\r\nSubject: s\r\n\r\nraw of ${n.id}` : null });
    const fetchMock = vi.fn(async (url: string) => jsonResponse(200, detail(notices.find((n) => url.endsWith(`/${n.id}`))!)));
    vi.stubGlobal('fetch', fetchMock);
    renderWithProviders(<Harness />);
    fireEvent.click(screen.getByRole('button', { name: /Read the notice to Sam Petro/ }));
    const failed = await screen.findByRole('region', { name: 'Notice' });
    expect(fetchMock).toHaveBeenCalledWith('/api/admin/mail/m2', expect.anything());
    expect(within(failed).getByText(/body of m2/)).toBeTruthy();
    expect(within(failed).getByRole('alert').textContent).toContain('ECONNREFUSED');
    expect(within(failed).queryByText(/as the catcher received it/)).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: /Read the notice to Lee Rev/ }));
    await waitFor(() => expect(screen.getByText(/raw of m1/)).toBeTruthy());
    expect(screen.getByText(/as the catcher received it/)).toBeTruthy();
  });
});
