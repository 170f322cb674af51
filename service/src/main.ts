import 'reflect-metadata';
import { fileURLToPath } from 'node:url';
import { createApp } from './bootstrap.js';
import { loadConfig } from './config/app-config.js';

const config = loadConfig();
config.uiDist ??= fileURLToPath(new URL('../../ui/dist', import.meta.url));
const app = await createApp(config);
await app.listen(config.port);
const where = config.databaseUrl ? 'PostgreSQL (DATABASE_URL)' : `PGlite in ${config.dataDir}`;
console.log(`Poreline listening on http://localhost:${config.port} (data: ${where}; demo mode: ${config.demoMode ? 'on' : 'off'})`);
