/** Tides, daylight and low-water windows: the pure computations, in one import. */
export * from './types.js';
export * from './units.js';
export * from './station-datums.js';
export * from './extremes.js';
export * from './series.js';
export * from './predict.js';
export * from './station-prediction.js';
export * from './datums.js';
export * from './time-zone.js';
export * from './daylight.js';
export * from './intervals.js';
export * from './windows.js';
export * from './window-ranking.js';
export * from './submergence.js';
export * from './site-windows.js';
