// Recomputes the checksum of a bench export in the browser (SHA-256 of the RFC 8785 canonical JSON).
import { verifyBenchExport, type BenchExport } from '@hexloom/bench';
import { useEffect, useState } from 'react';

/** `pending` while Web Crypto works, then whether the checksum matches; `failed` when the browser cannot hash. */
export type ChecksumCheck = { state: 'idle' | 'pending' | 'verified' | 'mismatch' | 'failed'; message?: string };

/**
 * Checks the checksum of `raw` (the export exactly as the server sent it, already accepted by the export
 * schema) against its other fields with libs/bench `verifyBenchExport`.
 */
export function useChecksumCheck(raw: unknown): ChecksumCheck {
  const [check, setCheck] = useState<ChecksumCheck>({ state: 'idle' });
  useEffect(() => {
    if (raw === undefined) {
      setCheck({ state: 'idle' });
      return;
    }
    let live = true;
    setCheck({ state: 'pending' });
    verifyBenchExport(raw as BenchExport)
      .then((ok) => live && setCheck({ state: ok ? 'verified' : 'mismatch' }))
      .catch((error: unknown) => live && setCheck({ state: 'failed', message: error instanceof Error ? error.message : String(error) }));
    return () => {
      live = false;
    };
  }, [raw]);
  return check;
}
