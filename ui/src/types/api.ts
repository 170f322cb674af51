/**
 * Response shapes of the Poreline HTTP API (see the API contract), as the UI reads them.
 * Depths and samples are in the units the server reports (`depthUnit`, curve `unit`).
 */

export type Role = 'admin' | 'petrophysicist' | 'engineer' | 'reviewer' | 'viewer';

export interface Membership {
  assetId: string;
  assetName: string;
  role: Role;
}

export interface Me {
  id: string;
  email: string;
  name: string;
  isAdmin: boolean;
  memberships: Membership[];
}

export interface LoginResponse {
  token: string;
  user: Me;
}

export interface Asset {
  id: string;
  name: string;
  description: string | null;
  role: Role;
  /** The invented demo asset (shows the model-vs-evaluated check). */
  isDemo?: boolean;
}

export interface LogRun {
  id: string;
  wellId: string;
  fileName: string;
  sha256: string;
  sizeBytes: number;
  lasVersion: string;
  wrapped: boolean;
  depthUnit: string;
  start: number;
  stop: number;
  /** null when the sampling is irregular. */
  step: number | null;
  rowCount: number;
  curveCount: number;
  uploadedAt: string;
  uploadedBy: string | null;
  uploadedByName: string | null;
}

export interface WellRow {
  id: string;
  name: string;
  uwi: string | null;
  logRunCount: number;
  curveCount: number;
  top: number | null;
  base: number | null;
  depthUnit: string | null;
  logRuns: LogRun[];
}

export interface Curve {
  id: string;
  mnemonic: string;
  unit: string;
  description: string;
  curveClass: string | null;
  nullCount: number;
  min: number | null;
  max: number | null;
}

export type Severity = 'error' | 'warning' | 'info';

export interface Diagnostic {
  severity: Severity;
  line: number | null;
  message: string;
}

export interface LogRunDetail extends LogRun {
  curves: Curve[];
  diagnostics: Diagnostic[];
}

export interface WellDetail extends Omit<WellRow, 'logRuns'> {
  logRuns: LogRunDetail[];
}

export type UploadStatus = 'stored' | 'duplicate' | 'rejected';

export interface UploadResult {
  fileName: string;
  status: UploadStatus;
  logRunId?: string;
  message?: string;
  line?: number | null;
  diagnostics: Diagnostic[];
}

export interface UploadResponse {
  results: UploadResult[];
}

/** Error body of the service (NestJS shape). */
export interface ErrorBody {
  statusCode: number;
  message: string | string[];
  error?: string;
}
