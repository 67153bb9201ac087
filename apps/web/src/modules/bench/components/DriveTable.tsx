// Drive values of every phase shifter (voltage, current, power) and the total electrical power.
import { Callout, HTMLTable, Tag } from '@blueprintjs/core';
import type { DriveValueBody } from '@hexloom/contracts';
import { formatNumber } from '../../figures/utils/formatFigure.js';
import { shifterName } from '../utils/shifterName.js';
import { sumPowerW } from '../utils/sumPowerW.js';

export type DriveTableProps = {
  drives: readonly DriveValueBody[];
  /** The total the export states, W; a warning shows when it differs from the sum of the rows. */
  reportedTotalW: number;
};

/** Relative tolerance between the stated total and the sum of the rows (rounding only). */
const TOTAL_TOLERANCE = 1e-9;

/** One row per shifter, units in the headers; the footer sums the power of the rows. */
export function DriveTable({ drives, reportedTotalW }: DriveTableProps) {
  const totalW = sumPowerW(drives);
  const disagrees = Math.abs(totalW - reportedTotalW) > TOTAL_TOLERANCE * Math.max(1e-3, Math.abs(totalW));
  if (drives.length === 0) return <p className="hx-bench-note">No phase shifter needs a drive: every gate is parked.</p>;
  return (
    <div className="hx-bench-scroll" tabIndex={0} role="region" aria-label="Drive values per phase shifter (scrolls)">
      {disagrees && (
        <Callout intent="danger" icon="error" role="alert" title="The stated total power does not match the rows">
          The export states {formatNumber(reportedTotalW * 1e3)} mW, but its rows add up to {formatNumber(totalW * 1e3)} mW. Do not use this export; export
          it again.
        </Callout>
      )}
      <HTMLTable compact striped className="hx-bench-table" aria-label="Drive values per phase shifter">
        <thead>
          <tr>
            <th scope="col">Gate</th>
            <th scope="col">Shifter</th>
            <th scope="col" className="hx-num">Target phase (rad)</th>
            <th scope="col" className="hx-num">Voltage (V)</th>
            <th scope="col" className="hx-num">Current (mA)</th>
            <th scope="col" className="hx-num">Power (mW)</th>
            <th scope="col">From</th>
          </tr>
        </thead>
        <tbody>
          {drives.map((d) => (
            <tr key={`${d.gate}:${d.shifter}`}>
              <td className="hx-mono">{d.gate}</td>
              <td>{shifterName(d.shifter)}</td>
              <td className="hx-num">{formatNumber(d.targetPhaseRad)}</td>
              <td className="hx-num">{formatNumber(d.voltageV)}</td>
              <td className="hx-num">{formatNumber(d.currentA * 1e3)}</td>
              <td className="hx-num">{formatNumber(d.powerW * 1e3)}</td>
              <td>{d.source === 'calibration' ? <Tag minimal>calibration</Tag> : <Tag minimal intent="warning">technology profile</Tag>}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row" colSpan={5}>
              Total electrical power
            </th>
            <td className="hx-num" data-testid="total-power">
              {formatNumber(totalW * 1e3)} mW
            </td>
            <td />
          </tr>
        </tfoot>
      </HTMLTable>
    </div>
  );
}
