/** @hexloom/mesh: hexagonal waveguide mesh model, port graph, gate states, checker and router (pure). */
export * from './axial.js';
export * from './mesh-error.js';
export * from './mesh-ids.js';
export * from './mesh-definition.js';
export * from './shape-cells.js';
export * from './mesh.js';
export * from './build-mesh.js';
export * from './gate-state.js';
export * from './configuration.js';
