import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { createWell, demoAssetId } from '../../test/workbench-fixtures.js';
import { PayloadTooLargeFilter } from './payload-too-large.filter.js';
import { SURVEY_UPLOAD_MAX_BYTES, uploadLimitFor } from './upload-limits.js';

describe(PayloadTooLargeFilter.name, () => {
  let t: TestApp;
  let wellUrl: string;
  beforeAll(async () => {
    // UPLOAD_MAX_MB of 50 here: larger than the survey's own limit, so the two messages differ.
    t = await createTestApp({ uploadMaxBytes: 50 * 1024 * 1024 });
    const assetId = await demoAssetId(t);
    wellUrl = `/api/assets/${assetId}/wells/${await createWell(t, assetId, 'BIG-1')}`;
  });
  afterAll(async () => t.close());

  it('uploadLimitFor(path) gives the survey route its own limit and every other upload UPLOAD_MAX_MB', () => {
    const config = { uploadMaxBytes: 123 };
    expect(uploadLimitFor('/api/assets/a/wells/w/survey', config).bytes).toBe(SURVEY_UPLOAD_MAX_BYTES);
    expect(uploadLimitFor('/api/assets/a/wells/w/survey/?x=1', config).bytes).toBe(SURVEY_UPLOAD_MAX_BYTES);
    expect(uploadLimitFor('/api/assets/a/wells/w/log-runs', config)).toMatchObject({ bytes: 123, advice: expect.stringContaining('UPLOAD_MAX_MB') });
    expect(uploadLimitFor('/api/assets/a/wells/w/production', config).bytes).toBe(123);
  });

  it('a survey over 5 MB is 413 quoting the survey limit, not UPLOAD_MAX_MB', async () => {
    const big = Buffer.alloc(SURVEY_UPLOAD_MAX_BYTES + 1024, 'x');
    const res = await t.http.post(`${wellUrl}/survey`).set('Authorization', await t.tokenFor('petrophysicist')).attach('file', big, 'survey.csv');
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/upload limit of 5 MB for this request/);
    expect(res.body.message).not.toContain('UPLOAD_MAX_MB');
  });
});
