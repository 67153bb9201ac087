// The drawing of a built mesh: toolbar, zoomable SVG, tooltip and legend.
import { Button, ButtonGroup } from '@blueprintjs/core';
import type { ConfigurationFile } from '@hexloom/contracts';
import type { Mesh } from '@hexloom/mesh';
import { useMemo, useRef, useState, type FocusEvent, type KeyboardEvent, type PointerEvent } from 'react';
import { useElementWidth } from '../hooks/useElementWidth.js';
import { useMeshZoom } from '../hooks/useMeshZoom.js';
import { gateLooks } from '../utils/gateLooks.js';
import { meshLayout } from '../utils/meshLayout.js';
import { MeshGates } from './MeshGates.js';
import { MeshLegend } from './MeshLegend.js';
import { MeshPorts } from './MeshPorts.js';

export type MeshCanvasViewProps = {
  mesh: Mesh;
  configuration: ConfigurationFile | undefined;
  selectedGateId: string | undefined;
  onGateClick: ((gateId: string) => void) | undefined;
  highlightCircuits: boolean;
  highlightGateIds?: readonly string[] | undefined;
  highlightLabel?: string | undefined;
  height: number;
  ariaLabel: string;
};

type Tip = { text: string; x: number; y: number };
const PAN_PX = 60;
const ZOOM_STEP = 1.25;

const tipOf = (target: EventTarget): Element | null => (target as Element).closest?.('[data-tooltip]') ?? null;

/** See MeshCanvas; this part assumes the mesh built. */
export function MeshCanvasView({ mesh, configuration, selectedGateId, onGateClick, highlightCircuits, highlightGateIds, highlightLabel = 'Highlighted gate', height, ariaLabel }: MeshCanvasViewProps) {
  const wrapperRef = useRef<HTMLDivElement>(null);
  const svgRef = useRef<SVGSVGElement>(null);
  const layerRef = useRef<SVGGElement>(null);
  const width = useElementWidth(wrapperRef);
  const layout = useMemo(() => meshLayout(mesh), [mesh]);
  const looks = useMemo(() => gateLooks(mesh, configuration), [mesh, configuration]);
  const circuits = useMemo(() => (highlightCircuits ? (configuration?.circuits ?? []) : []), [highlightCircuits, configuration]);
  const circuitPorts = useMemo(() => new Map(circuits.flatMap((c, index) => c.ports.map((p) => [p, { index, circuit: c.id }] as const))), [circuits]);
  const wirings = useMemo(() => new Set(mesh.ports.map((p) => p.wiredTo)), [mesh]);
  const marked = useMemo(() => new Set(highlightGateIds ?? []), [highlightGateIds]);
  const view = useMeshZoom(svgRef, layerRef, layout.bounds, width, height);
  const [tip, setTip] = useState<Tip | null>(null);

  const showTip = (element: Element, clientX?: number, clientY?: number) => {
    const box = wrapperRef.current?.getBoundingClientRect();
    const own = element.getBoundingClientRect();
    const x = (clientX ?? own.left + own.width / 2) - (box?.left ?? 0);
    const y = (clientY ?? own.top) - (box?.top ?? 0);
    setTip({ text: element.getAttribute('data-tooltip') ?? '', x, y });
  };
  const onPointerOver = (event: PointerEvent) => {
    const element = tipOf(event.target);
    if (element) showTip(element, event.clientX, event.clientY);
  };
  const onFocus = (event: FocusEvent) => {
    const element = tipOf(event.target);
    if (element) showTip(element);
    else setTip(null);
  };
  const onKeyDown = (event: KeyboardEvent) => {
    if (event.ctrlKey || event.metaKey || event.altKey) return;
    const actions: Record<string, () => void> = {
      f: view.fit,
      F: view.fit,
      '+': () => view.zoomBy(ZOOM_STEP),
      '=': () => view.zoomBy(ZOOM_STEP),
      '-': () => view.zoomBy(1 / ZOOM_STEP),
      _: () => view.zoomBy(1 / ZOOM_STEP),
      ArrowLeft: () => view.panBy(PAN_PX, 0),
      ArrowRight: () => view.panBy(-PAN_PX, 0),
      ArrowUp: () => view.panBy(0, PAN_PX),
      ArrowDown: () => view.panBy(0, -PAN_PX),
    };
    const action = actions[event.key];
    if (!action) return;
    event.preventDefault();
    action();
  };

  return (
    <div className="hx-mesh-canvas" ref={wrapperRef} data-testid="mesh-canvas">
      <div className="hx-mesh-canvas-frame" onKeyDown={onKeyDown} onPointerOver={onPointerOver} onPointerLeave={() => setTip(null)} onFocus={onFocus} onBlur={() => setTip(null)}>
        <ButtonGroup className="hx-mesh-canvas-toolbar">
          <Button icon="zoom-in" aria-label="Zoom in" title="Zoom in (+)" onClick={() => view.zoomBy(ZOOM_STEP)} />
          <Button icon="zoom-out" aria-label="Zoom out" title="Zoom out (-)" onClick={() => view.zoomBy(1 / ZOOM_STEP)} />
          <Button icon="zoom-to-fit" aria-label="Fit the mesh in view" title="Fit to view (f)" onClick={view.fit} />
        </ButtonGroup>
        <svg ref={svgRef} className="hx-mesh-canvas-svg" width="100%" height={height} role="group" aria-label={ariaLabel} tabIndex={0}>
          <g ref={layerRef}>
            <g className="hx-mesh-cells" aria-hidden="true">
              {layout.cells.map((c) => (
                <polygon key={c.id} className="hx-mesh-cell" points={c.points} />
              ))}
            </g>
            <MeshGates gates={layout.gates} looks={looks} side={layout.side} selectedGateId={selectedGateId} onGateClick={onGateClick} highlightCircuits={highlightCircuits} markedGateIds={marked} markLabel={highlightLabel} />
            <MeshPorts ports={layout.ports} side={layout.side} circuitPorts={circuitPorts} />
          </g>
        </svg>
        {tip && (
          <div className="hx-mesh-tooltip" role="tooltip" data-testid="mesh-tooltip" style={{ left: Math.min(Math.max(tip.x, 110), Math.max(110, width - 110)), top: Math.max(tip.y, 44) }}>
            {tip.text.charAt(0).toUpperCase() + tip.text.slice(1)}
          </div>
        )}
      </div>
      <MeshLegend circuits={circuits} wirings={wirings} unitLengthUm={mesh.definition.technology.unitLengthUm} {...(marked.size > 0 ? { markLabel: `${highlightLabel} (${marked.size})` } : {})} />
    </div>
  );
}
