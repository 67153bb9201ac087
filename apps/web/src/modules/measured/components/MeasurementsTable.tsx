// The measured spectra of a version, each with a button that opens its comparison with the simulation.
import { Button, HTMLTable } from '@blueprintjs/core';
import type { Measurement, MeshDefinitionFile } from '@hexloom/contracts';
import { formatDate } from '../../teams/utils/formatDate.js';
import { portName } from '../../workspace/utils/portName.js';

export type MeasurementsTableProps = {
  measurements: readonly Measurement[];
  definition: MeshDefinitionFile;
  selectedId: string | null;
  onCompare: (id: string) => void;
};

/** One row per measurement: label, file, connection by port names, points, who and when. */
export function MeasurementsTable({ measurements, definition, selectedId, onCompare }: MeasurementsTableProps) {
  return (
    <div className="hx-measured-scroll">
      <HTMLTable compact striped aria-label="Measurements of this version" className="hx-measured-table">
        <thead>
          <tr>
            <th scope="col">Label</th>
            <th scope="col">File</th>
            <th scope="col">Connection</th>
            <th scope="col" className="hx-num">Points</th>
            <th scope="col">Uploaded</th>
            <th scope="col">
              <span className="hx-measured-sr">Comparison</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {measurements.map((m) => {
            const name = m.label || m.fileName;
            return (
              <tr key={m.id}>
                <td>{m.label || '—'}</td>
                <td>
                  {m.fileName} ({m.format === 'csv' ? 'CSV' : 'Touchstone'})
                </td>
                <td>
                  {portName(definition, m.from)} → {portName(definition, m.to)}
                </td>
                <td className="hx-num">{m.points}</td>
                <td>
                  {m.uploadedBy || 'someone'}, {formatDate(m.uploadedAt)}
                </td>
                <td>
                  <Button size="small" icon="comparison" text="Compare" aria-label={`Compare ${name} with the simulation`} active={m.id === selectedId} onClick={() => onCompare(m.id)} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </div>
  );
}
