/** File formats and request bodies of the frequency-domain solver. */
export * from './frequency-grid.js';
export * from './simulate-request.js';
export * from './spectrum-file.js';
export * from './s-parameters-file.js';
