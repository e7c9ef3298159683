/**
 * Persons capacity for small boats without a rating to hand (TRADE.md §1). These are
 * suggestions for the fleet form, never a rating: the capacity plate or the maker's figure wins.
 */

/**
 * Boater-education rule of thumb for a monohull under 20 ft with no plate, in calm water with
 * 150-lb persons: persons = length × beam (feet) ÷ 15, rounded down. Not in 33 CFR 183; source:
 * boat-ed.com study guide "Calculating your boat's capacity" (TRADE.md §1).
 * @example ruleOfThumbPersons(16, 5) // 5 (80 / 15 = 5.33)
 */
export function ruleOfThumbPersons(lengthFt: number, beamFt: number): number {
  if (!(lengthFt > 0 && beamFt > 0)) return 0;
  return Math.floor((lengthFt * beamFt) / 15 + 1e-9);
}

/**
 * 33 CFR 183.41 (outboard boats): persons = (persons capacity in lb + 32) / 141, rounded half
 * up, where the persons capacity is the maximum weight capacity less the motor, controls,
 * battery and fuel of its Table 4 (the caller deducts them). Source: law.cornell.edu copy of
 * §183.41 and the USCG boatbuilder's handbook (TRADE.md §1).
 * @example personsFromWeightCapacity183_41(550) // 4 (582 / 141 = 4.13)
 */
export function personsFromWeightCapacity183_41(personsCapacityLb: number): number {
  if (!(personsCapacityLb > 0)) return 0;
  return Math.floor((personsCapacityLb + 32) / 141 + 0.5);
}

/**
 * 33 CFR 183.43 (manually propelled boats): persons capacity = 0.9 × maximum weight capacity,
 * then the same count as §183.41. Source: a copy of §183.43 (TRADE.md §1).
 * @example personsFromManualWeightCapacity183_43(800) // 5 (720 lb → 5.33)
 */
export function personsFromManualWeightCapacity183_43(maxWeightCapacityLb: number): number {
  return personsFromWeightCapacity183_41(0.9 * maxWeightCapacityLb);
}
