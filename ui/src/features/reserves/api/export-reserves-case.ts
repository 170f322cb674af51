import { useMutation } from '@tanstack/react-query';
import { apiBinary } from '../../../lib/api-client';
import { downloadBlob, fileStem } from '../../../lib/svg-export';
import { casePath } from './case-mutation';

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/** GET .../:caseId/export?format=xlsx: the case workbook (inputs with provenance, results, cross-checks). */
export async function exportReservesCase(assetId: string, caseId: string): Promise<Blob> {
  const bytes = await apiBinary(`${casePath(assetId, caseId)}/export?format=xlsx`);
  return new Blob([bytes], { type: XLSX });
}

/** Downloads the workbook as `<case name>-rev<n>.xlsx`. */
export function useExportReservesCase(assetId: string, caseId: string) {
  return useMutation({
    mutationFn: async ({ name, revision }: { name: string; revision: number }) => {
      downloadBlob(await exportReservesCase(assetId, caseId), `${fileStem(name)}-rev${revision}.xlsx`);
    },
  });
}
