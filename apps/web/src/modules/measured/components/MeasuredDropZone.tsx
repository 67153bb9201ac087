// A drop zone with a file button for one measured CSV or Touchstone file.
import { FileInput } from '@blueprintjs/core';
import { useState, type DragEvent } from 'react';

export type MeasuredDropZoneProps = { fileName: string | undefined; onFile: (file: File) => void };

/** Drop a file on it, or choose one with the button. */
export function MeasuredDropZone({ fileName, onFile }: MeasuredDropZoneProps) {
  const [dragging, setDragging] = useState(false);
  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    const file = event.dataTransfer.files[0];
    if (file) onFile(file);
  };
  return (
    <div
      className={`hx-measured-drop${dragging ? ' hx-measured-drop--active' : ''}`}
      data-testid="measured-drop-zone"
      onDragOver={(event) => {
        event.preventDefault();
        setDragging(true);
      }}
      onDragLeave={() => setDragging(false)}
      onDrop={onDrop}
    >
      <p className="hx-measured-hint">
        Drop a measured spectrum here: a CSV with <span className="hx-mono">frequency_hz</span> (or <span className="hx-mono">frequency_ghz</span>) and{' '}
        <span className="hx-mono">amplitude_db</span> (or <span className="hx-mono">re</span>, <span className="hx-mono">im</span>) columns, or a Touchstone .s2p file. Or choose a file.
      </p>
      <FileInput
        text={fileName ?? 'Choose a file…'}
        buttonText="Browse"
        inputProps={{ accept: '.csv,.s1p,.s2p,.s3p,.s4p,text/csv,text/plain', 'aria-label': 'Measured spectrum file (CSV or Touchstone)' }}
        onInputChange={(event) => {
          const file = event.currentTarget.files?.[0];
          if (file) onFile(file);
        }}
      />
    </div>
  );
}
