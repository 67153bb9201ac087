// One measurement compared with the simulation of its connection: the overlay and the residual figures.
import { Spinner } from '@blueprintjs/core';
import type { Measurement, MeshDefinitionFile } from '@hexloom/contracts';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { portName } from '../../workspace/utils/portName.js';
import { useComparison } from '../api/useComparison.js';
import { ComparisonChart } from './ComparisonChart.js';
import { ResidualFigures } from './ResidualFigures.js';

export type ComparisonViewProps = { teamId: string; configurationId: string; versionNumber: number; measurement: Measurement; definition: MeshDefinitionFile };

/** Loads the comparison; its errors (e.g. no overlap with the simulated span) are shown in words. */
export function ComparisonView({ teamId, configurationId, versionNumber, measurement, definition }: ComparisonViewProps) {
  const comparison = useComparison(teamId, configurationId, versionNumber, measurement.id);
  const pair = `${portName(definition, measurement.from)} → ${portName(definition, measurement.to)}`;
  const name = measurement.label || measurement.fileName;
  return (
    <section className="hx-measured-section" aria-labelledby="hx-measured-comparison">
      <h3 id="hx-measured-comparison" className="hx-measured-heading">
        {name}: measured against simulated, {pair}
      </h3>
      {comparison.isPending && (
        <span className="hx-measured-inline">
          <Spinner size={16} aria-label="Loading the comparison" /> Simulating on the measured frequencies…
        </span>
      )}
      <ApiErrorCallout error={comparison.error} title="Could not compare this measurement" onRetry={() => void comparison.refetch()} />
      {comparison.data && (
        <>
          <ResidualFigures figures={comparison.data.figures} />
          <ComparisonChart comparison={comparison.data} ariaLabel={`Measured and simulated transmitted power of ${pair}`} />
        </>
      )}
    </section>
  );
}
