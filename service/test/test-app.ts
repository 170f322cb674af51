import 'reflect-metadata';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { inject } from 'vitest';
import { createApp } from '../src/bootstrap.js';
import type { AppConfig } from '../src/config/app-config.js';
import { DEMO_USERS } from '../src/seed/demo-users.js';

export interface TestApp {
  app: NestExpressApplication;
  http: ReturnType<typeof request>;
  dataDir: string;
  /** Signs in a demo user by role and returns the bearer header value. */
  tokenFor(role: (typeof DEMO_USERS)[number]['role']): Promise<string>;
  close(): Promise<void>;
}

/**
 * The real app on a real PGlite database: a copy of the migrated template folder made once
 * per run (global-setup.ts), so each test file starts from a clean, migrated database.
 */
export async function createTestApp(overrides: Partial<AppConfig> = {}): Promise<TestApp> {
  const root = mkdtempSync(join(tmpdir(), 'poreline-test-'));
  const dataDir = join(root, 'pg');
  cpSync(inject('pgliteTemplateDir'), dataDir, { recursive: true });
  const config: AppConfig = {
    port: 0,
    dataDir,
    jwtSecret: 'test-secret-not-for-production',
    jwtTtl: '1h',
    demoMode: true,
    // The demo users and empty demo asset only; pass { demoData: 'full' } for the whole demo field.
    demoData: 'users',
    uploadMaxBytes: 5 * 1024 * 1024,
    // No SMTP_URL: the built-in catcher receives the notices (a real SMTP server on 127.0.0.1).
    mailFrom: 'Poreline test <poreline@localhost>',
    publicUrl: 'http://poreline.test',
    ...overrides,
  };
  const app = await createApp(config, { logger: false });
  const http = request(app.getHttpServer());
  const tokens = new Map<string, string>();
  return {
    app,
    http,
    dataDir,
    async tokenFor(role) {
      const cached = tokens.get(role);
      if (cached) return cached;
      const user = DEMO_USERS.find((u) => u.role === role)!;
      const res = await http.post('/api/auth/login').send({ email: user.email, password: user.password });
      if (res.status !== 200) throw new Error(`login as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
      const value = `Bearer ${res.body.token}`;
      tokens.set(role, value);
      return value;
    },
    async close() {
      await app.close();
      rmSync(root, { recursive: true, force: true });
    },
  };
}
