import { readFileSync } from 'node:fs';

/** The service's version (service/package.json), written into every export's provenance block. */
export const APP_VERSION: string = (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
