// One chip of the team: its size and wiring (its name links to the chip page), and its configurations with their review status.
import { Card, HTMLTable, Spinner, Tag } from '@blueprintjs/core';
import type { Chip } from '@hexloom/contracts';
import { Link } from 'react-router-dom';
import { chipPath, configurationPath } from '../../../routes.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { formatDate } from '../../teams/utils/formatDate.js';
import { useChipConfigurations } from '../api/useChipConfigurations.js';
import { describeShape } from '../utils/describeShape.js';
import { StatusTag } from './StatusTag.js';
import './chips.css';

/** A card per chip: name linking to its page, size, ports, technology summary, calibration tag and configurations table. */
export function ChipCard({ chip, teamId, teamSlug }: { chip: Chip; teamId: string; teamSlug: string }) {
  const configurations = useChipConfigurations(teamId, chip.id);
  const tech = chip.definition.technology;
  return (
    <Card className="hx-chip-card" data-testid="chip-card">
      <header className="hx-chip-header">
        <h3>
          <Link to={chipPath(teamSlug, chip.id)}>{chip.name}</Link>
        </h3>
        <span className="hx-muted">
          {describeShape(chip.definition.shape)} · {chip.definition.ports.length} ports · {tech.unitLengthUm} µm units · {tech.lossPerGateDb} dB per gate
        </span>
        <Tag minimal intent={chip.hasCalibration ? 'success' : 'warning'}>{chip.hasCalibration ? 'calibrated' : 'no calibration'}</Tag>
      </header>
      {configurations.isPending && <Spinner size={20} />}
      {configurations.error && <ApiErrorCallout error={configurations.error} title="Could not load the configurations" />}
      {configurations.data && configurations.data.length === 0 && <p className="hx-muted">No configurations on this chip yet.</p>}
      {configurations.data && configurations.data.length > 0 && (
        <div className="hx-table-scroll" tabIndex={0} role="region" aria-label={`Configurations of ${chip.name}`}>
        <HTMLTable compact striped className="hx-full-width" data-testid="configurations-table">
          <thead>
            <tr>
              <th>Configuration</th>
              <th>Latest version</th>
              <th>Status</th>
              <th>Author</th>
              <th>Updated</th>
            </tr>
          </thead>
          <tbody>
            {configurations.data.map((c) => (
              <tr key={c.id}>
                <td>
                  <Link to={configurationPath(teamSlug, c.id)}>{c.name}</Link>
                </td>
                <td className="hx-mono">v{c.headVersion}</td>
                <td>
                  <StatusTag status={c.headStatus} />
                </td>
                <td className="hx-mono">{c.createdBy}</td>
                <td className="hx-mono">{formatDate(c.updatedAt)}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
        </div>
      )}
    </Card>
  );
}
