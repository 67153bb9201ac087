// MeshCanvas: the mesh drawn to scale with its gate states, circuits and ports; pan, zoom, keyboard and tooltips.
import { Callout } from '@blueprintjs/core';
import type { ConfigurationFile } from '@hexloom/contracts';
import { buildMesh, type Mesh, type MeshDefinition } from '@hexloom/mesh';
import { useMemo } from 'react';
import '../meshCanvas.css';
import { MeshCanvasView } from './MeshCanvasView.js';

/** Props of {@link MeshCanvas}. */
export type MeshCanvasProps = {
  definition: MeshDefinition;
  /** When given, gate states come from its settings and its circuits are highlighted. */
  configuration?: ConfigurationFile;
  selectedGateId?: string;
  /** Makes every gate a button (click, Enter, Space) that reports its gate id. */
  onGateClick?: (gateId: string) => void;
  /** Halo every circuit's gates and ring its ports in the circuit's colour (default true). */
  highlightCircuits?: boolean;
  /** Gates to mark with an extra outline (e.g. the gates two versions set differently); named in the legend. */
  highlightGateIds?: readonly string[];
  /** What the marked gates are, for the legend and each gate's description (default "Highlighted gate"). */
  highlightLabel?: string;
  /** Height of the drawing in CSS pixels (default 480); the width follows the container. */
  height?: number;
  ariaLabel?: string;
};

/**
 * The chip's mesh drawn to scale: hexagonal cells, one gate per edge coloured by state (bar, cross, split, idle,
 * dead), ports at the mesh edge with the chip's labels and wiring, a legend, d3-zoom pan and zoom and the
 * keyboard shortcuts of `MESH_CANVAS_SHORTCUTS`. A definition that does not build is reported in words.
 */
export function MeshCanvas({ definition, configuration, selectedGateId, onGateClick, highlightCircuits = true, highlightGateIds, highlightLabel = 'Highlighted gate', height = 480, ariaLabel }: MeshCanvasProps) {
  const built = useMemo((): { mesh: Mesh } | { error: string } => {
    try {
      return { mesh: buildMesh(definition) };
    } catch (error) {
      return { error: error instanceof Error ? error.message : String(error) };
    }
  }, [definition]);
  if ('error' in built) {
    return (
      <Callout intent="danger" role="alert">
        <p className="hx-mesh-error-title">This mesh cannot be drawn</p>
        {built.error}
      </Callout>
    );
  }
  return (
    <MeshCanvasView
      mesh={built.mesh}
      configuration={configuration}
      selectedGateId={selectedGateId}
      onGateClick={onGateClick}
      highlightCircuits={highlightCircuits}
      highlightGateIds={highlightGateIds}
      highlightLabel={highlightLabel}
      height={height}
      ariaLabel={ariaLabel ?? `Mesh of ${definition.name}`}
    />
  );
}
