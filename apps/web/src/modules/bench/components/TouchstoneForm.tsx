// Ports and span of the Touchstone (.s2p) export of the simulated S-parameters.
import { Button, FormGroup, HTMLSelect, InputGroup } from '@blueprintjs/core';
import { useState } from 'react';
import type { TouchstoneRequest } from '../api/benchPaths.js';

/** A port of the chip by its label. */
export type TouchstonePort = { id: string; label: string };

export type TouchstoneFormProps = {
  ports: readonly TouchstonePort[];
  /** Initial ports (ids), e.g. those of the first circuit. */
  initialFrom: string;
  initialTo: string;
  /** Initial span half-width, Hz (half the unit FSR). */
  halfSpanHz: number;
  disabled: boolean;
  pending: boolean;
  onSubmit: (request: TouchstoneRequest) => void;
};

/** What is wrong with the form, in words, or null. */
function problem(from: string, to: string, startGhz: number, stopGhz: number, points: number): string | null {
  if (from === to) return 'Choose two different ports.';
  if (!Number.isFinite(startGhz) || !Number.isFinite(stopGhz)) return 'Give the span start and stop in GHz.';
  if (!(stopGhz > startGhz)) return 'The span must stop above where it starts.';
  if (!(Number.isInteger(points) && points >= 2 && points <= 20001)) return 'Points must be a whole number from 2 to 20 001.';
  return null;
}

/** From/to ports, start/stop offsets from the carrier (GHz) and points; one download button. */
export function TouchstoneForm({ ports, initialFrom, initialTo, halfSpanHz, disabled, pending, onSubmit }: TouchstoneFormProps) {
  const [from, setFrom] = useState(initialFrom);
  const [to, setTo] = useState(initialTo);
  const half = Number((halfSpanHz / 1e9).toPrecision(4));
  const [start, setStart] = useState(String(-half));
  const [stop, setStop] = useState(String(half));
  const [points, setPoints] = useState('1001');
  const issue = problem(from, to, Number(start), Number(stop), Number(points));
  const options = ports.map((p) => ({ value: p.id, label: p.label }));
  const submit = () => {
    if (issue) return;
    onSubmit({ fromPort: from, toPort: to, startOffsetHz: Number(start) * 1e9, stopOffsetHz: Number(stop) * 1e9, points: Number(points) });
  };
  return (
    <div className="hx-bench-touchstone">
      <div className="hx-bench-fields">
        <FormGroup label="Port 1" labelFor="hx-ts-from">
          <HTMLSelect id="hx-ts-from" value={from} options={options} onChange={(e) => setFrom(e.currentTarget.value)} />
        </FormGroup>
        <FormGroup label="Port 2" labelFor="hx-ts-to">
          <HTMLSelect id="hx-ts-to" value={to} options={options} onChange={(e) => setTo(e.currentTarget.value)} />
        </FormGroup>
        <FormGroup label="Start offset (GHz)" labelFor="hx-ts-start">
          <InputGroup id="hx-ts-start" inputMode="decimal" value={start} onValueChange={setStart} />
        </FormGroup>
        <FormGroup label="Stop offset (GHz)" labelFor="hx-ts-stop">
          <InputGroup id="hx-ts-stop" inputMode="decimal" value={stop} onValueChange={setStop} />
        </FormGroup>
        <FormGroup label="Points" labelFor="hx-ts-points">
          <InputGroup id="hx-ts-points" inputMode="numeric" value={points} onValueChange={setPoints} />
        </FormGroup>
      </div>
      {issue && <p className="hx-bench-problem" role="status">{issue}</p>}
      <Button icon="export" text="Download Touchstone (.s2p)" disabled={disabled || issue !== null} loading={pending} onClick={submit} />
    </div>
  );
}
