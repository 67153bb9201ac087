// Pick a circuit of the version and one of its outputs, and see the whole chip's simulated response there.
import { Callout, FormGroup, HTMLSelect, Spinner } from '@blueprintjs/core';
import type { ConfigurationVersion } from '@hexloom/contracts';
import { useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useSimulation } from '../api/useSimulation.js';
import { ResponsePlot } from './ResponsePlot.js';

type Props = { teamId: string; version: ConfigurationVersion };

/** The input of a circuit is its first port; every other port is an output to look at. */
export function CircuitResponse({ teamId, version }: Props) {
  const circuits = version.content.circuits.filter((c) => c.ports.length >= 2);
  const [circuitId, setCircuitId] = useState(circuits[0]?.id);
  const circuit = circuits.find((c) => c.id === circuitId) ?? circuits[0];
  const [output, setOutput] = useState<string | undefined>(undefined);
  const from = circuit?.ports[0];
  const to = output && circuit?.ports.includes(output) && output !== from ? output : circuit?.ports[circuit.ports.length - 1];
  const simulation = useSimulation({ teamId, configurationId: version.configurationId, number: version.number, from, to });
  if (!circuit) return <Callout intent="primary">This version has no circuit with an input and an output to simulate.</Callout>;
  const figures = version.figures[circuit.id];
  return (
    <section className="hx-stack" data-testid="circuit-response">
      <div className="hx-row">
        <FormGroup label="Circuit" inline>
          <HTMLSelect value={circuit.id} onChange={(e) => setCircuitId(e.currentTarget.value)} data-testid="circuit-select">
            {circuits.map((c) => (
              <option key={c.id} value={c.id}>
                {c.id} ({c.kind})
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        <FormGroup label={`From ${from} to`} inline>
          <HTMLSelect value={to} onChange={(e) => setOutput(e.currentTarget.value)} data-testid="output-select">
            {circuit.ports.slice(1).map((p) => (
              <option key={p} value={p}>
                {p}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
      </div>
      {simulation.isPending && <Spinner size={30} />}
      <ApiErrorCallout error={simulation.error} title="Could not simulate this version" />
      {simulation.data && <ResponsePlot spectrum={simulation.data} />}
      {simulation.data && (
        <p className="hx-muted hx-mono" data-testid="run-summary">
          whole chip, {simulation.data.run.steps} unit-delay steps, residual energy {simulation.data.run.residualEnergy.toExponential(1)}, {simulation.data.points.offsetHz.length} points
        </p>
      )}
      {figures && (
        <dl className="hx-figures" data-testid="circuit-figures">
          {Object.entries(figures).map(([name, value]) => (
            <div key={name}>
              <dt>{name}</dt>
              <dd className="hx-mono">{Number.isInteger(value) ? value : value.toPrecision(4)}</dd>
            </div>
          ))}
        </dl>
      )}
    </section>
  );
}
