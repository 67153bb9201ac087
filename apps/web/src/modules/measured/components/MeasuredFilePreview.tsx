// The preview of a measured file before it is saved: what was detected, the span and the first rows.
import { HTMLTable } from '@blueprintjs/core';
import { formatFrequencyHz, formatNumber } from '../../figures/utils/formatFigure.js';
import type { MeasuredFilePreview as Preview } from '../utils/previewMeasuredFile.js';

export type MeasuredFilePreviewProps = { fileName: string; preview: Preview; referenceFrequencyHz: number };

/** Facts in words, then the first rows with units in the headers. */
export function MeasuredFilePreview({ fileName, preview, referenceFrequencyHz }: MeasuredFilePreviewProps) {
  return (
    <div className="hx-measured-preview" data-testid="measured-preview">
      <p className="hx-measured-title">
        {fileName}: {preview.format === 'csv' ? 'spectrum CSV' : `Touchstone file with ${preview.portCount} ${preview.portCount === 1 ? 'port' : 'ports'}`}, {preview.pointCount} points from {formatFrequencyHz(preview.startHz)} to{' '}
        {formatFrequencyHz(preview.stopHz)}
      </p>
      <dl className="hx-measured-facts">
        {preview.detected.map((d) => (
          <div key={d.label}>
            <dt>{d.label}</dt>
            <dd>{d.value}</dd>
          </div>
        ))}
      </dl>
      <div className="hx-measured-scroll">
        <HTMLTable compact striped aria-label={`First ${preview.firstRows.length} rows of ${fileName}`}>
          <thead>
            <tr>
              <th scope="col">Point</th>
              <th scope="col" className="hx-num">Frequency (THz)</th>
              <th scope="col" className="hx-num">Offset from the carrier (GHz)</th>
              <th scope="col" className="hx-num">Power (dB)</th>
            </tr>
          </thead>
          <tbody>
            {preview.firstRows.map((r, i) => (
              <tr key={r.frequencyHz}>
                <td>{i + 1}</td>
                <td className="hx-num">{formatNumber(r.frequencyHz / 1e12, 10)}</td>
                <td className="hx-num">{formatNumber((r.frequencyHz - referenceFrequencyHz) / 1e9)}</td>
                <td className="hx-num">{formatNumber(r.powerDb)}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
    </div>
  );
}
