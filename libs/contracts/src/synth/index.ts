/** File formats of synthesis: specifications and their masks. */
export * from './mask.js';
export * from './filter-spec.js';
export * from './figure-catalogue.js';
