// A point of the mesh drawing (x east, y south, in drawing units).

/** A point in drawing units; x grows to the east, y to the south (SVG convention). */
export type CanvasPoint = { x: number; y: number };
