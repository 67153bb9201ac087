// A blank mask table row with a unique React key.
import type { MaskRow } from './specFormValues.js';

let nextKey = 0;

/** A fresh, blank row of `kind` with a unique React key. */
export function emptyMaskRow(kind: MaskRow['kind'] = 'pass'): MaskRow {
  nextKey += 1;
  return { key: `mask-row-${nextKey}`, kind, fromGHz: '', toGHz: '', maxInsertionLossDb: '', maxRippleDb: '', minRejectionDb: '', maxDelayRipplePs: '', delayPs: '', delayTolerancePs: '', port: '' };
}
