import type { ReservesCase } from '@poreline/schema';
import type { CaseResults } from './case-engine.js';
import type { CrossCheckTables } from './case-export.js';
import type { CaseInputs } from './case-inputs.js';

/**
 * Supplies a case's cross-check tables (p/z and decline fits of its wells' production data) to
 * the export. Implemented by the production feature, which owns those data.
 */
export abstract class CaseCrossChecks {
  abstract tablesFor(assetId: string, caseRow: ReservesCase, inputs: CaseInputs, results: CaseResults | null): Promise<CrossCheckTables>;
}
