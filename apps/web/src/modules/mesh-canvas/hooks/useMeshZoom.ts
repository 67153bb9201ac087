// Pan and zoom of the mesh canvas through d3-zoom: fit, zoom by a factor, pan by pixels.
import { select, zoom, zoomIdentity, zoomTransform, type ZoomBehavior } from 'd3';
import { useCallback, useEffect, useMemo, useRef, type RefObject } from 'react';
import { fitTransform, type CanvasBounds } from '../utils/fitTransform.js';

/** The view controls the canvas toolbar and keyboard use. */
export type MeshZoomControls = { fit: () => void; zoomBy: (factor: number) => void; panBy: (dx: number, dy: number) => void };

/**
 * Attaches d3-zoom to `svgRef` and writes its transform onto `layerRef` (outside React, so panning does not
 * re-render hundreds of gates). The view is fitted to the bounds whenever their values or the viewport size change.
 */
export function useMeshZoom(svgRef: RefObject<SVGSVGElement | null>, layerRef: RefObject<SVGGElement | null>, box: CanvasBounds, width: number, height: number): MeshZoomControls {
  const behaviour = useRef<ZoomBehavior<SVGSVGElement, unknown> | null>(null);
  // Keyed by value: a new definition with the same extent (say, one more dead gate) keeps the user's view.
  const { minX, minY, maxX, maxY } = box;
  const bounds = useMemo(() => ({ minX, minY, maxX, maxY }), [minX, minY, maxX, maxY]);

  const fit = useCallback(() => {
    const svg = svgRef.current;
    if (!svg || !behaviour.current) return;
    const t = fitTransform(bounds, width, height);
    behaviour.current.transform(select(svg), zoomIdentity.translate(t.x, t.y).scale(t.k));
  }, [svgRef, bounds, width, height]);

  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const fitted = fitTransform(bounds, width, height).k;
    const z = zoom<SVGSVGElement, unknown>()
      .extent([
        [0, 0],
        [width, height],
      ])
      .scaleExtent([fitted / 4, fitted * 24])
      .on('zoom', (event: { transform: { toString(): string } }) => layerRef.current?.setAttribute('transform', event.transform.toString()));
    behaviour.current = z;
    select(svg).call(z);
    const t = fitTransform(bounds, width, height);
    z.transform(select(svg), zoomIdentity.translate(t.x, t.y).scale(t.k));
    return () => {
      select(svg).on('.zoom', null);
      behaviour.current = null;
    };
  }, [svgRef, layerRef, bounds, width, height]);

  const zoomBy = useCallback(
    (factor: number) => {
      if (svgRef.current && behaviour.current) behaviour.current.scaleBy(select(svgRef.current), factor);
    },
    [svgRef],
  );
  const panBy = useCallback(
    (dx: number, dy: number) => {
      const svg = svgRef.current;
      if (!svg || !behaviour.current) return;
      const k = zoomTransform(svg).k;
      behaviour.current.translateBy(select(svg), dx / k, dy / k);
    },
    [svgRef],
  );
  return { fit, zoomBy, panBy };
}

