// The gates of the mesh canvas: one focusable group per gate, coloured by state, haloed by circuit.
import { memo, useId, type KeyboardEvent, type MouseEvent } from 'react';
import { circuitColour } from '../utils/circuitColour.js';
import { describeGate, gateDetails, gateName } from '../utils/describeGate.js';
import type { GateLook } from '../utils/gateLooks.js';
import type { LaidOutGate } from '../utils/meshLayout.js';
import { segmentMidpoint } from '../utils/segmentMidpoint.js';

export type MeshGatesProps = {
  gates: readonly LaidOutGate[];
  looks: ReadonlyMap<string, GateLook>;
  side: number;
  selectedGateId?: string | undefined;
  onGateClick?: ((gateId: string) => void) | undefined;
  highlightCircuits: boolean;
  /** Gates drawn with an extra outline and described with `markLabel`. */
  markedGateIds?: ReadonlySet<string> | undefined;
  markLabel?: string | undefined;
};

const gateOf = (target: EventTarget): string | undefined => (target as Element).closest?.('[data-gate-id]')?.getAttribute('data-gate-id') ?? undefined;

/**
 * Every gate as `<g data-gate-id class="hx-mesh-gate hx-mesh-gate--<state>">` named "gate g(0,1)e, bar", with the details
 * (coupling, parked state, circuits) as its description; buttons (Enter, Space, click) when `onGateClick` is given.
 */
export const MeshGates = memo(function MeshGates({ gates, looks, side, selectedGateId, onGateClick, highlightCircuits, markedGateIds, markLabel }: MeshGatesProps) {
  const clickable = onGateClick !== undefined;
  const descriptionPrefix = useId();
  const onClick = (event: MouseEvent) => {
    const id = gateOf(event.target);
    if (id && onGateClick) onGateClick(id);
  };
  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key !== 'Enter' && event.key !== ' ') return;
    const id = gateOf(event.target);
    if (!id || !onGateClick) return;
    event.preventDefault();
    onGateClick(id);
  };
  const mark = side * 0.12;
  return (
    <g className="hx-mesh-gates" onClick={clickable ? onClick : undefined} onKeyDown={clickable ? onKeyDown : undefined}>
      {gates.map(({ id, segment }) => {
        const look = looks.get(id) ?? { state: 'idle', circuits: [], circuitIndex: null };
        const descriptionId = `${descriptionPrefix}${id}`;
        const selected = id === selectedGateId;
        const marked = markedGateIds?.has(id) === true;
        const { from, to } = segment;
        const mid = segmentMidpoint(segment);
        const ends = { x1: from.x, y1: from.y, x2: to.x, y2: to.y };
        return (
          <g
            key={id}
            className={`hx-mesh-gate hx-mesh-gate--${look.state}${selected ? ' hx-mesh-gate--selected' : ''}${marked ? ' hx-mesh-gate--marked' : ''}`}
            data-gate-id={id}
            data-marked={marked ? 'true' : undefined}
            data-tooltip={describeGate(id, look)}
            role={clickable ? 'button' : 'img'}
            tabIndex={clickable ? 0 : undefined}
            aria-label={gateName(id, look)}
            aria-describedby={descriptionId}
            aria-pressed={clickable && selectedGateId !== undefined ? selected : undefined}
          >
            <desc id={descriptionId}>{marked ? `${markLabel ?? 'Highlighted gate'}. ${gateDetails(look)}` : gateDetails(look)}</desc>
            {selected && <line className="hx-mesh-gate-selection" {...ends} />}
            {marked && <line className="hx-mesh-gate-mark-outline" {...ends} />}
            {highlightCircuits && look.circuitIndex !== null && (
              <>
                <line className="hx-mesh-gate-halo" stroke={circuitColour(look.circuitIndex)} {...ends} />
                <line className="hx-mesh-gate-halo-gap" {...ends} />
              </>
            )}
            <line className="hx-mesh-gate-hit" {...ends} />
            <line className="hx-mesh-gate-line" {...ends} />
            {look.state === 'split' && <circle className="hx-mesh-gate-mark" cx={mid.x} cy={mid.y} r={mark} />}
            {look.state === 'dead' && <path className="hx-mesh-gate-mark" d={`M${mid.x - mark},${mid.y - mark}L${mid.x + mark},${mid.y + mark}M${mid.x - mark},${mid.y + mark}L${mid.x + mark},${mid.y - mark}`} />}
          </g>
        );
      })}
    </g>
  );
});
