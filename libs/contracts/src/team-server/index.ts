/** API bodies, answers and file formats of the team server (chips, versions, reviews, bench). */
export * from './chip.js';
export * from './calibration.js';
export * from './configuration-version.js';
export * from './version-diff.js';
export * from './compute.js';
export * from './yield-job.js';
export * from './review.js';
export * from './review-waiting.js';
export * from './measurement.js';
export * from './bench-export.js';
export * from './outbox.js';
export * from './version-number.js';
