// The shifters of a chip's current calibration as a table with units.
import { HTMLTable } from '@blueprintjs/core';
import type { Calibration } from '@hexloom/contracts';
import { formatNumber } from '../../figures/utils/formatFigure.js';
import { formatDate } from '../../teams/utils/formatDate.js';

const SHIFTER_WORDS = { theta: 'internal (θ, sets the coupling)', phi: 'outer (φ, sets the phase)' } as const;

/** Who uploaded which file when, then one row per phase shifter: offset (rad), P_π (mW), resistance (Ω), limits (mW, V). */
export function CalibrationTable({ calibration }: { calibration: Calibration }) {
  return (
    <div className="hx-stack" data-testid="calibration-table">
      <p className="hx-muted" style={{ margin: 0 }}>
        {calibration.shifters.length} phase shifters from <span className="hx-mono">{calibration.fileName}</span>, uploaded by {calibration.uploadedBy} on{' '}
        {formatDate(calibration.uploadedAt)}. Shifters without a row are driven from the technology profile.
      </p>
      <div className="hx-table-scroll">
        <HTMLTable compact striped className="hx-full-width">
          <thead>
            <tr>
              <th scope="col">Gate</th>
              <th scope="col">Phase shifter</th>
              <th scope="col">Offset at zero power (rad)</th>
              <th scope="col">Power for π (mW)</th>
              <th scope="col">Resistance (Ω)</th>
              <th scope="col">Largest power (mW)</th>
              <th scope="col">Largest voltage (V)</th>
            </tr>
          </thead>
          <tbody>
            {calibration.shifters.map((s) => (
              <tr key={`${s.gate}/${s.shifter}`}>
                <td className="hx-mono">{s.gate}</td>
                <td>{SHIFTER_WORDS[s.shifter]}</td>
                <td className="hx-num">{formatNumber(s.offsetRad)}</td>
                <td className="hx-num">{formatNumber(s.piPowerW * 1000)}</td>
                <td className="hx-num">{formatNumber(s.resistanceOhm)}</td>
                <td className="hx-num">{formatNumber(s.maxPowerW * 1000)}</td>
                <td className="hx-num">{formatNumber(s.maxVoltageV)}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
    </div>
  );
}
