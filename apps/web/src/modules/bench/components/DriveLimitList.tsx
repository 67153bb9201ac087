// The shifters a bench export refused because their drive would exceed the chip's limits, in words.
import { Callout } from '@blueprintjs/core';
import type { DriveViolationBody } from '../api/DriveLimitRequestError.js';
import { describeViolation } from '../utils/describeViolation.js';

export type DriveLimitListProps = { violations: readonly DriveViolationBody[] };

/** A danger callout with one line per shifter: where, which quantity, value against limit. */
export function DriveLimitList({ violations }: DriveLimitListProps) {
  return (
    <Callout intent="danger" icon="error" role="alert" title={`No drive values: ${violations.length} ${violations.length === 1 ? 'shifter exceeds its limit' : 'shifters exceed their limits'}`}>
      <p className="hx-bench-note">
        The server computes no drive table while any heater would be driven past the chip&apos;s limits. Change the
        configuration or the chip&apos;s calibration, then export again.
      </p>
      <ul aria-label="Drive values beyond their limits" className="hx-bench-violations">
        {violations.map((v) => {
          const w = describeViolation(v);
          return (
            <li key={`${v.gate}:${v.shifter}:${v.quantity}`}>
              {w.where}: {w.quantity.toLowerCase()} {w.value}, above the limit of {w.limit}
            </li>
          );
        })}
      </ul>
    </Callout>
  );
}
