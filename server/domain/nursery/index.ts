/** Nursery computations (salinity, mixing, brining plans, readiness, growth), in one import. */
export * from './errors.js';
export * from './dates.js';
export * from './format.js';
export * from './seawater.js';
export * from './mixing.js';
export * from './brining-plan.js';
export * from './brining-tasks.js';
export * from './salinity-hold.js';
export * from './crown-clearance.js';
export * from './readiness.js';
export * from './growth.js';
