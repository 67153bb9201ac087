// The external ports of the mesh canvas: a wiring symbol at the mesh edge and the chip's own label.
import { memo } from 'react';
import { circuitColour } from '../utils/circuitColour.js';
import { describePort } from '../utils/describePort.js';
import type { LaidOutPort } from '../utils/meshLayout.js';
import { PORT_LABEL_FONT } from '../utils/spreadPortLabels.js';
import { PortMarker } from './PortMarker.js';

export type MeshPortsProps = {
  ports: readonly LaidOutPort[];
  side: number;
  /** Circuit index and id of each port a circuit owns, by port id. */
  circuitPorts: ReadonlyMap<string, { index: number; circuit: string }>;
};

/** Every port as `<g data-port-id class="hx-mesh-port hx-mesh-port--<wiring>">`, circuit ports ringed in the circuit's colour. */
export const MeshPorts = memo(function MeshPorts({ ports, side, circuitPorts }: MeshPortsProps) {
  const size = (side * 0.3) ** 2;
  return (
    <g className="hx-mesh-ports">
      {ports.map((port) => {
        const owner = circuitPorts.get(port.id);
        const label = describePort(port, owner?.circuit);
        const { marker, textAnchor } = port.anchor;
        const { at, moved } = port.placed;
        return (
          <g key={port.id} className={`hx-mesh-port hx-mesh-port--${port.wiredTo}`} data-port-id={port.id} data-tooltip={label} role="img" aria-label={label}>
            <g transform={`translate(${marker.x} ${marker.y})`}>
              {owner && <circle className="hx-mesh-port-ring" r={side * 0.3} stroke={circuitColour(owner.index)} />}
              <PortMarker wiredTo={port.wiredTo} size={size} />
            </g>
            {port.label && moved && <line className="hx-mesh-port-leader" x1={marker.x} y1={marker.y} x2={at.x} y2={at.y} />}
            {port.label && (
              <text className="hx-mesh-port-label" x={at.x} y={at.y} textAnchor={textAnchor} dominantBaseline="middle" fontSize={side * PORT_LABEL_FONT.size}>
                {port.label}
              </text>
            )}
          </g>
        );
      })}
    </g>
  );
});
