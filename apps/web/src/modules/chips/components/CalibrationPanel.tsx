// The Calibration tab: the chip's current calibration, and the upload for designers and owners.
import { Spinner } from '@blueprintjs/core';
import type { Chip } from '@hexloom/contracts';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useCalibration } from '../api/useCalibration.js';
import { CalibrationTable } from './CalibrationTable.js';
import { CalibrationUpload } from './CalibrationUpload.js';

export type CalibrationPanelProps = { teamId: string; chip: Chip; canEdit: boolean };

/** The table of calibrated shifters (or "none yet"), then the CSV upload when the role may change the chip. */
export function CalibrationPanel({ teamId, chip, canEdit }: CalibrationPanelProps) {
  const calibration = useCalibration(teamId, chip.id);
  return (
    <div className="hx-stack" data-testid="calibration-panel">
      {calibration.isPending && <Spinner size={24} aria-label="Loading the calibration" />}
      <ApiErrorCallout error={calibration.error} title="Could not load the calibration" />
      {calibration.data === null && <p className="hx-muted">No calibration uploaded yet: every phase shifter is driven from the technology profile.</p>}
      {calibration.data && <CalibrationTable calibration={calibration.data} />}
      {canEdit ? <CalibrationUpload teamId={teamId} chip={chip} /> : <p className="hx-muted">Designers and owners upload calibrations.</p>}
    </div>
  );
}
