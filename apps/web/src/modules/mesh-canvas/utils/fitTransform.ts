// The pan and zoom that shows a whole drawing inside a viewport.

/** An axis-aligned box in drawing units. */
export type CanvasBounds = { minX: number; minY: number; maxX: number; maxY: number };

/** A d3-zoom style transform: screen = k * drawing + (x, y). */
export type ViewTransform = { k: number; x: number; y: number };

/** Scale and offset that centre `bounds` in a `width` x `height` viewport with `padding` pixels free on every side. */
export function fitTransform(bounds: CanvasBounds, width: number, height: number, padding = 16): ViewTransform {
  const w = Math.max(bounds.maxX - bounds.minX, 1e-9);
  const h = Math.max(bounds.maxY - bounds.minY, 1e-9);
  const k = Math.max(1e-6, Math.min((width - 2 * padding) / w, (height - 2 * padding) / h));
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  return { k, x: width / 2 - k * cx, y: height / 2 - k * cy };
}
