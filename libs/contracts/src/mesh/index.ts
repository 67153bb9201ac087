/** File formats of the mesh engine: mesh definitions and configurations. */
export * from './mesh-definition.js';
export * from './configuration.js';
export * from './route-request.js';
