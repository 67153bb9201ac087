// A spec file's mask (Hz) -> mask table rows (GHz), for prefilling the table.
import type { Mask } from '@hexloom/contracts';
import { numberToText } from './numberText.js';
import { emptyMaskRow } from './emptyMaskRow.js';
import type { MaskRow } from './specFormValues.js';

const GHZ = 1e9;
/** Rows for every region; `portRef` maps a region's port (id or label) to a pickable ref ('' when it is not one). */
export function maskToMaskRows(mask: Mask, portRef: (ref: string) => string = (ref) => ref): MaskRow[] {
  return mask.regions.map((region) => {
    const row = emptyMaskRow(region.kind);
    row.fromGHz = numberToText(region.range.fromHz, GHZ);
    row.toGHz = numberToText(region.range.toHz, GHZ);
    row.port = region.port === undefined ? '' : portRef(region.port);
    if (region.kind === 'pass') {
      row.maxInsertionLossDb = numberToText(region.maxInsertionLossDb);
      row.maxRippleDb = numberToText(region.maxRippleDb);
    } else if (region.kind === 'stop') {
      row.minRejectionDb = numberToText(region.minRejectionDb);
    } else {
      row.maxDelayRipplePs = numberToText(region.maxDelayRipplePs);
      row.delayPs = numberToText(region.delayPs);
      row.delayTolerancePs = numberToText(region.delayTolerancePs);
    }
    return row;
  });
}
