// The key of the mesh canvas: gate states, port wiring, circuits and the drawing's scale.
import type { PortWiring } from '@hexloom/mesh';
import { CANVAS_GATE_STATES, CANVAS_GATE_STATE_WORDS } from '../utils/canvasGateState.js';
import { circuitColour } from '../utils/circuitColour.js';
import { PORT_WIRING_WORDS } from '../utils/describePort.js';
import { PortMarker } from './PortMarker.js';

const WIRINGS: readonly PortWiring[] = ['fibre', 'modulator', 'detector', 'none'];

export type MeshLegendProps = {
  /** Circuits to list with their colours (empty when circuits are not highlighted). */
  circuits: readonly { id: string; kind: string }[];
  /** Wirings the chip uses (only those are listed). */
  wirings: ReadonlySet<PortWiring>;
  unitLengthUm: number;
  /** Names the outlined gates when some are marked ("Changed gate (4)"). */
  markLabel?: string;
};

/** A compact legend, `data-testid="mesh-legend"`, with one item per gate state (`data-state`). */
export function MeshLegend({ circuits, wirings, unitLengthUm, markLabel }: MeshLegendProps) {
  return (
    <div className="hx-mesh-legend" data-testid="mesh-legend">
      <ul aria-label="Gate states">
        {CANVAS_GATE_STATES.map((state) => (
          <li key={state} data-state={state}>
            <svg width="30" height="14" aria-hidden="true" className={`hx-mesh-gate hx-mesh-gate--${state}`}>
              <line className="hx-mesh-gate-line" x1="3" y1="7" x2="27" y2="7" />
              {state === 'split' && <circle className="hx-mesh-gate-mark" cx="15" cy="7" r="3" />}
              {state === 'dead' && <path className="hx-mesh-gate-mark" d="M11,3L19,11M11,11L19,3" />}
            </svg>
            {CANVAS_GATE_STATE_WORDS[state]}
          </li>
        ))}
        {markLabel && (
          <li data-state="marked">
            <svg width="30" height="14" aria-hidden="true" className="hx-mesh-gate">
              <line className="hx-mesh-gate-mark-outline" x1="5" y1="7" x2="25" y2="7" />
            </svg>
            {markLabel}
          </li>
        )}
      </ul>
      {wirings.size > 0 && (
        <ul aria-label="Port wiring">
          {WIRINGS.filter((w) => wirings.has(w)).map((w) => (
            <li key={w} data-wiring={w}>
              <svg width="16" height="16" viewBox="-8 -8 16 16" aria-hidden="true" className="hx-mesh-port">
                <PortMarker wiredTo={w} size={48} />
              </svg>
              {PORT_WIRING_WORDS[w]}
            </li>
          ))}
        </ul>
      )}
      {circuits.length > 0 && (
        <ul aria-label="Circuits">
          {circuits.map((c, i) => (
            <li key={c.id} data-circuit={c.id}>
              <span className="hx-mesh-legend-circuit" style={{ background: circuitColour(i) }} aria-hidden="true" />
              {c.id} <span className="hx-muted">({c.kind})</span>
            </li>
          ))}
        </ul>
      )}
      <p className="hx-muted hx-mesh-legend-scale">Each cell edge is one gate, one unit of {unitLengthUm.toLocaleString('en-GB')} µm.</p>
    </div>
  );
}
