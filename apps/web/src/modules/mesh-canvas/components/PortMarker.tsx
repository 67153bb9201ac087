// The symbol of a port's wiring: circle fibre, square modulator, triangle detector, hollow ring for none.
import type { PortWiring } from '@hexloom/mesh';
import { symbol, symbolCircle, symbolSquare, symbolTriangle } from 'd3';

const SHAPES = { fibre: symbolCircle, modulator: symbolSquare, detector: symbolTriangle, none: symbolCircle } as const;

/** A d3 symbol of area `size` (drawing units squared) centred on the origin, classed by wiring. */
export function PortMarker({ wiredTo, size }: { wiredTo: PortWiring; size: number }) {
  return <path className={`hx-mesh-port-marker hx-mesh-port-marker--${wiredTo}`} d={symbol(SHAPES[wiredTo], size)() ?? ''} />;
}
