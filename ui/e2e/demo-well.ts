import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/**
 * Sets up a workbench well through the API, from the committed Wrenmoor demo data
 * (demo-wells/data): the well, its LAS file, the field's formations (created when the asset
 * lacks them), its tops from tops.csv, the seeded well's zone parameters (when the demo seed
 * loaded it) and confirmed curve bindings.
 */

const demoData = (path: string) => fileURLToPath(new URL(`../../demo-wells/data/${path}`, import.meta.url));

export const DEMO_FORMATIONS: { name: string; lithology: string }[] = [
  { name: 'Greyling Shale', lithology: 'shaly_sand' },
  { name: 'Fenna Sand', lithology: 'sandstone' },
  { name: 'Marrow Shale', lithology: 'shaly_sand' },
  { name: 'Wren Sand', lithology: 'sandstone' },
  { name: 'Tillet Shaly Sand', lithology: 'shaly_sand' },
  { name: 'Corrie Limestone', lithology: 'limestone' },
  { name: 'Pellow Shale', lithology: 'shaly_sand' },
];

export async function login(baseUrl: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`login ${email}: ${res.status} ${await res.text()}`);
  return ((await res.json()) as { token: string }).token;
}

export async function api<T>(baseUrl: string, token: string, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { authorization: `Bearer ${token}`, ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${text}`);
  return (text ? JSON.parse(text) : undefined) as T;
}

interface Named {
  id: string;
  name: string;
}

/** Creates well `wellName` as a copy of demo well `demoWell` (its LAS files and tops). */
export async function setUpDemoWell(baseUrl: string, token: string, wellName: string, demoWell = 'WM-1'): Promise<{ assetId: string; wellId: string }> {
  const assets = await api<Named[]>(baseUrl, token, 'GET', '/assets');
  const asset = assets.find((a) => a.name === 'Wrenmoor Field');
  if (!asset) throw new Error('the demo asset Wrenmoor Field is missing');
  const well = await api<Named>(baseUrl, token, 'POST', `/assets/${asset.id}/wells`, { name: wellName });

  const wells = readFileSync(demoData('wells.csv'), 'utf8').trim().split('\n').slice(1);
  const row = wells.map((l) => l.split(',')).find((c) => c[0] === demoWell);
  if (!row) throw new Error(`no demo well ${demoWell}`);
  const form = new FormData();
  for (const file of row[9].split(';')) form.append('files', new Blob([readFileSync(demoData(file))]), file.split('/').pop());
  const up = await fetch(`${baseUrl}/api/assets/${asset.id}/wells/${well.id}/log-runs`, { method: 'POST', headers: { authorization: `Bearer ${token}` }, body: form });
  if (!up.ok) throw new Error(`upload: ${up.status} ${await up.text()}`);

  let formations = await api<Named[]>(baseUrl, token, 'GET', `/assets/${asset.id}/formations`);
  for (const f of DEMO_FORMATIONS) {
    if (!formations.some((x) => x.name === f.name)) await api(baseUrl, token, 'POST', `/assets/${asset.id}/formations`, f);
  }
  formations = await api<Named[]>(baseUrl, token, 'GET', `/assets/${asset.id}/formations`);
  const tops = readFileSync(demoData('tops.csv'), 'utf8')
    .trim()
    .split('\n')
    .slice(1)
    .map((l) => l.split(','))
    .filter((c) => c[0] === demoWell)
    .map((c) => ({ formationId: formations.find((f) => f.name === c[1])!.id, md: Number(c[2]), source: 'table' }));
  await api(baseUrl, token, 'PUT', `/assets/${asset.id}/wells/${well.id}/tops`, { tops });
  // The seeded demo well's zone parameters, when the seed has it, so the copy evaluates the same way.
  const seeded = (await api<Named[]>(baseUrl, token, 'GET', `/assets/${asset.id}/wells`)).find((w) => w.name === demoWell);
  if (seeded) {
    for (const t of tops) {
      const p = await api<{ params: unknown; isDefault: boolean }>(baseUrl, token, 'GET', `/assets/${asset.id}/wells/${seeded.id}/zones/${t.formationId}/parameters`);
      if (!p.isDefault) await api(baseUrl, token, 'PUT', `/assets/${asset.id}/wells/${well.id}/zones/${t.formationId}/parameters`, { params: p.params });
    }
  }
  const bindings = await api<{ binding: string; logRunId: string; mnemonic: string }[]>(baseUrl, token, 'GET', `/assets/${asset.id}/wells/${well.id}/bindings`);
  await api(baseUrl, token, 'PUT', `/assets/${asset.id}/wells/${well.id}/bindings`, {
    bindings: bindings.map((b) => ({ binding: b.binding, logRunId: b.logRunId, mnemonic: b.mnemonic })),
  });
  return { assetId: asset.id, wellId: well.id };
}
