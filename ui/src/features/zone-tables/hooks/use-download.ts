import { useState } from 'react';
import { downloadBlob } from '../../../lib/svg-export';

/** Runs a server export and offers its bytes as a download; keeps which one is busy and the last error. */
export function useDownload() {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const run = async (id: string, fetchBytes: () => Promise<ArrayBuffer>, fileName: string, mime: string) => {
    setBusy(id);
    setError(null);
    try {
      const bytes = await fetchBytes();
      downloadBlob(new Blob([bytes], { type: mime }), fileName);
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setBusy(null);
    }
  };
  return { busy, error, run };
}
