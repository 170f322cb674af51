import { openDatabase } from '@poreline/schema';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    pgliteTemplateDir: string;
  }
}

/** Builds one migrated PGlite database folder for the whole run; test files copy it. */
export default async function setup(project: TestProject) {
  const root = mkdtempSync(join(tmpdir(), 'poreline-template-'));
  const dir = join(root, 'pg');
  const db = await openDatabase({ dataDir: dir });
  await db.migrate();
  await db.close();
  project.provide('pgliteTemplateDir', dir);
  return () => rmSync(root, { recursive: true, force: true });
}
