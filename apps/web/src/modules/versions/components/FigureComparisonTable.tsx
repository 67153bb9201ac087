// Figures of each circuit in versions A and B side by side, in words and units, with the change.
import { HTMLTable } from '@blueprintjs/core';
import type { ConfigurationVersion } from '@hexloom/contracts';
import { useMemo } from 'react';
import { figureComparison } from '../utils/figureComparison.js';

/** One table per circuit with figures in either version; changed rows are emphasised. */
export function FigureComparisonTable({ a, b }: { a: ConfigurationVersion; b: ConfigurationVersion }) {
  const circuits = useMemo(() => {
    const kindOf = (id: string) => (b.specs.find((s) => s.circuitId === id) ?? a.specs.find((s) => s.circuitId === id))?.spec.spec.kind;
    return figureComparison(a.figures, b.figures, kindOf);
  }, [a, b]);
  return (
    <section className="hx-stack" aria-labelledby="figure-comparison-heading" data-testid="figure-comparison">
      <h3 id="figure-comparison-heading" className="hx-panel-title">
        Figures, v{a.number} (A) and v{b.number} (B)
      </h3>
      {circuits.length === 0 && <p className="hx-muted">Neither version has figures: the server computes them for circuits with a spec.</p>}
      {circuits.map((c) => (
        <div key={c.circuitId} className="hx-diff-figures">
          <HTMLTable compact className="hx-full-width" aria-label={`Figures of circuit ${c.circuitId}`} data-testid={`figures-${c.circuitId}`}>
            <caption className="hx-mono">Circuit {c.circuitId}</caption>
            <thead>
              <tr>
                <th scope="col">Figure</th>
                <th scope="col">v{a.number} (A)</th>
                <th scope="col">v{b.number} (B)</th>
                <th scope="col">Change</th>
              </tr>
            </thead>
            <tbody>
              {c.rows.map((r) => (
                <tr key={r.name} className={r.changed ? 'hx-diff-changed' : undefined}>
                  <th scope="row">{r.label}</th>
                  <td className="hx-mono">{r.before}</td>
                  <td className="hx-mono">{r.after}</td>
                  <td className="hx-mono">{r.changed ? <strong>{r.change}</strong> : <span className="hx-muted">{r.change}</span>}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      ))}
    </section>
  );
}
