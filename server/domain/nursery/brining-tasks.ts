/** Today's water swaps across tanks, from their brining plans. */
import type { BriningStep } from './brining-plan.js';
import { formatLitres, formatPpt } from './format.js';

/** A tank's name and its plan's steps. */
export interface TankPlan {
  tankName: string;
  steps: readonly BriningStep[];
}

/** One swap due on a day, with the line shown to the volunteer. */
export interface BriningTask extends BriningStep {
  tankName: string;
  message: string;
}

/** "tank B" for a tank named "B"; a name that already says "tank" or "bucket" is kept as it is. */
function tankLabel(name: string): string {
  return /^(tank|bucket)\b/i.test(name.trim()) ? name.trim() : `tank ${name.trim()}`;
}

/**
 * The swaps due on `date` across tanks, in the order given.
 * @example tasksDueOn([{ tankName: 'B', steps }], '2026-03-05')
 *   // [{ …step, tankName: 'B', message: 'replace 3.8 L in tank B with 35 ppt water' }]
 */
export function tasksDueOn(tanks: readonly TankPlan[], date: string): BriningTask[] {
  return tanks.flatMap((tank) =>
    tank.steps
      .filter((step) => step.date === date)
      .map((step) => {
        const water = step.stockPpt === 0 ? 'fresh water' : `${formatPpt(step.stockPpt)} water`;
        return { ...step, tankName: tank.tankName, message: `replace ${formatLitres(step.replaceLitres)} in ${tankLabel(tank.tankName)} with ${water}` };
      }),
  );
}
