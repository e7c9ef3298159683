/** Trip plans and the capacity of a day: the pure planner, in one import. */
export * from './types.js';
export { DEFAULT_LOAD_MARGIN, DEFAULT_STANDARD_PERSON_KG, DEFAULT_TIME_LIMIT_SECONDS, isPlated, marginFor, standardWeight } from './context.js';
export { MAX_POT_CLASSES, potClasses, potMasses, type PotClass } from './pot-classes.js';
export { potsAboard, validateTripPlan } from './validate.js';
export { heuristicTripPlan } from './heuristic.js';
export { solveTripPlan } from './solve.js';
export { initTripSolver } from './milp-solve.js';
export { dayCapacity, type DayCapacity, type DayCapacityInput } from './capacity.js';
export { ruleOfThumbPersons, personsFromWeightCapacity183_41, personsFromManualWeightCapacity183_43 } from './rules-of-thumb.js';
export * from './api.js';
export { violationText, type ViolationWords } from './violation-text.js';
export { warmUpInstance } from './warm-up.js';
