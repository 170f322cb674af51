import type { Interpretation } from '@poreline/schema';
import type { InterpretationDto, UserRefDto } from './dto/interpretation.dto.js';

export function toInterpretationDto(row: Interpretation, names: ReadonlyMap<string, string>): InterpretationDto {
  const ref = (id: string | null): UserRefDto | null => (id ? { id, name: names.get(id) ?? '(removed user)' } : null);
  return {
    id: row.id,
    wellId: row.wellId,
    version: row.version,
    status: row.status,
    inputs: row.inputs,
    summaries: row.summaries,
    warnings: row.warnings,
    createdBy: ref(row.createdBy),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    submittedBy: ref(row.submittedBy),
    submittedAt: row.submittedAt?.toISOString() ?? null,
    reviewedBy: ref(row.reviewedBy),
    reviewedAt: row.reviewedAt?.toISOString() ?? null,
    reviewComment: row.reviewComment,
  };
}

/** The user ids a row refers to (to look their names up in one query). */
export const userIdsOf = (rows: readonly Interpretation[]) => rows.flatMap((r) => [r.createdBy, r.submittedBy, r.reviewedBy]);

/** A compact view for the audit log: version, status and net pay (MD) per zone. */
export function interpretationAuditView(row: Pick<Interpretation, 'version' | 'status' | 'summaries' | 'reviewComment'>) {
  return {
    version: row.version,
    status: row.status,
    netPay: Object.fromEntries(row.summaries.map((s) => [String(s.zone), (s.netPay as { thickness: { md: number } } | undefined)?.thickness.md ?? null])),
    ...(row.reviewComment ? { reviewComment: row.reviewComment } : {}),
  };
}
