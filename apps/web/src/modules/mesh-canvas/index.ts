// Public door of the mesh canvas module.
export { MeshCanvas, type MeshCanvasProps } from './components/MeshCanvas.js';
export { MESH_CANVAS_SHORTCUTS, type MeshCanvasShortcut } from './utils/meshCanvasShortcuts.js';
export { circuitColour, CIRCUIT_PALETTE } from './utils/circuitColour.js';
export { CANVAS_GATE_STATES, CANVAS_GATE_STATE_WORDS, type CanvasGateState } from './utils/canvasGateState.js';
export { gateLooks, type GateLook } from './utils/gateLooks.js';
export { describeGate, gateDetails, gateName } from './utils/describeGate.js';
export { describePort } from './utils/describePort.js';
