// Drop or choose a calibration CSV: it is read in the browser, each bad row is listed, and only a clean file is sent.
import { Button, Callout, FileInput } from '@blueprintjs/core';
import { CALIBRATION_COLUMNS, CalibrationCsvError, parseCalibrationCsv, type CalibrationIssue } from '@hexloom/bench';
import type { Chip } from '@hexloom/contracts';
import { buildMesh } from '@hexloom/mesh';
import { useMemo, useState, type DragEvent } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { usePutCalibration } from '../api/usePutCalibration.js';

type Checked = { file: File; shifters: number } | { file: File; issues: readonly CalibrationIssue[] };

export type CalibrationUploadProps = { teamId: string; chip: Chip };

/** A drop zone with a file button; rows are checked against the chip's gates before anything is uploaded. */
export function CalibrationUpload({ teamId, chip }: CalibrationUploadProps) {
  const knownGates = useMemo(() => {
    try {
      return new Set(buildMesh(chip.definition).gates.map((g) => g.id));
    } catch {
      return undefined;
    }
  }, [chip.definition]);
  const [checked, setChecked] = useState<Checked | null>(null);
  const [dragging, setDragging] = useState(false);
  const put = usePutCalibration(teamId, chip.id);

  const check = async (file: File | undefined) => {
    if (!file) return;
    put.reset();
    if (!/\.csv$/i.test(file.name)) {
      setChecked({ file, issues: [{ line: 1, column: null, reason: `"${file.name}" is not a .csv file` }] });
      return;
    }
    const text = (await file.text()).replace(/^\uFEFF/, '');
    try {
      setChecked({ file, shifters: parseCalibrationCsv(text, { knownGates }).length });
    } catch (error) {
      const issues = error instanceof CalibrationCsvError ? error.issues : [{ line: 1, column: null, reason: error instanceof Error ? error.message : String(error) }];
      setChecked({ file, issues });
    }
  };
  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    void check(event.dataTransfer.files[0]);
  };

  return (
    <section className="hx-stack" aria-label="Upload a calibration">
      <div
        className={`hx-drop-zone${dragging ? ' hx-drop-zone--active' : ''}`}
        data-testid="calibration-drop-zone"
        onDragOver={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
      >
        <p style={{ margin: 0 }}>
          Drop a calibration CSV here (columns <span className="hx-mono">{CALIBRATION_COLUMNS.join(', ')}</span>; powers in mW), or choose a file.
        </p>
        <FileInput
          text={checked?.file.name ?? 'Choose a CSV file…'}
          buttonText="Browse"
          inputProps={{ accept: '.csv,text/csv', 'aria-label': 'Calibration CSV file' }}
          onInputChange={(event) => void check(event.currentTarget.files?.[0])}
        />
      </div>
      {checked && 'issues' in checked && (
        <Callout intent="danger" role="alert" data-testid="calibration-issues">
          <p className="hx-callout-title">
            {checked.file.name} was not uploaded: {checked.issues.length === 1 ? 'one problem' : `${checked.issues.length} problems`}
          </p>
          <ul className="hx-issue-list">
            {checked.issues.map((i, k) => (
              <li key={`${i.line}-${i.column ?? ''}-${k}`}>
                Line {i.line}
                {i.column ? ` (${i.column})` : ''}: {i.reason}
              </li>
            ))}
          </ul>
          Correct the file and drop it again; nothing is sent while a row is wrong.
        </Callout>
      )}
      {checked && 'shifters' in checked && !put.isSuccess && (
        <Callout intent="primary">
          <p className="hx-callout-title">{`${checked.file.name}: ${checked.shifters} phase shifters read, every row is valid`}</p>
          <Button intent="primary" icon="upload" text="Upload this calibration" loading={put.isPending} onClick={() => put.mutate(checked.file)} />
        </Callout>
      )}
      {put.isSuccess && (
        <Callout intent="success" role="status">
          <p className="hx-callout-title">Calibration uploaded</p>
          {put.data.shifters.length} phase shifters stored from {put.data.fileName}.
        </Callout>
      )}
      <ApiErrorCallout error={put.error} title="The server refused the calibration" />
    </section>
  );
}
