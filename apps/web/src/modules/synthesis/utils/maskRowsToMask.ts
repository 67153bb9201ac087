// Mask table rows (GHz, dB, ps as text) -> the mask of the spec file, frequencies in Hz.
import type { Mask, MaskRegion } from '@hexloom/contracts';
import { optionalNumber, requiredNumber } from './numberText.js';
import type { MaskRow } from './specFormValues.js';

const GHZ = 1e9;

function withoutUndefined<T extends Record<string, unknown>>(object: T): T {
  return Object.fromEntries(Object.entries(object).filter(([, v]) => v !== undefined)) as T;
}

/** One row as a mask region: the limits of its kind only; a blank port means the circuit's main outputs. */
function maskRowToRegion(row: MaskRow): MaskRegion {
  const range = { fromHz: requiredNumber(row.fromGHz, GHZ), toHz: requiredNumber(row.toGHz, GHZ) };
  const port = row.port === '' ? undefined : row.port;
  switch (row.kind) {
    case 'pass':
      return withoutUndefined({ kind: 'pass', port, range, maxInsertionLossDb: optionalNumber(row.maxInsertionLossDb), maxRippleDb: optionalNumber(row.maxRippleDb) });
    case 'stop':
      return withoutUndefined({ kind: 'stop', port, range, minRejectionDb: requiredNumber(row.minRejectionDb) });
    case 'delay':
      return withoutUndefined({
        kind: 'delay', port, range,
        maxDelayRipplePs: optionalNumber(row.maxDelayRipplePs), delayPs: optionalNumber(row.delayPs), delayTolerancePs: optionalNumber(row.delayTolerancePs),
      });
  }
}

/** The whole table as a mask (the same object the plot can draw). */
export function maskRowsToMask(rows: readonly MaskRow[]): Mask {
  return { regions: rows.map(maskRowToRegion) };
}
