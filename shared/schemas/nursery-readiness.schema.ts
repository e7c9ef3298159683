import { z } from 'zod';
import { id, Named, nil, TreeIds, Warning } from './nursery-fields.schema.js';
import { TreeStage } from './nursery-rules.schema.js';

/** Whether trees can go to a site, and trees reserved for a planting workday. */
export const TreeReadinessQuery = z.object({ siteId: id('site').optional() });
export const ReserveTreesBody = z.object({ treeIds: TreeIds }).strict();
export const ReservedTreeParams = z.object({ id: id('workday'), treeId: id('tree') });

/** Whether one tree can go to one site, and why not. */
export const ReadinessDto = z.object({
  treeId: z.string(), tag: z.string(), stage: TreeStage, tank: nil(Named), ready: z.boolean(), reasons: z.array(Warning), cautions: z.array(Warning),
  crownSubmergedShare: z.number(), collarFloodedShare: z.number(), crownTopM: z.number(), requiredTopM: z.number(),
  heightShortfallCm: z.number(), heldDays: z.number(), readyBy: z.string().optional(),
});
export type ReadinessDto = z.infer<typeof ReadinessDto>;

const ReadinessSite = Named.extend({ salinityPpt: nil(z.number()) });
const ReadinessDatums = { today: z.string(), mhhwM: z.number(), mslM: z.number() };

export const SiteReadinessDto = z.object({ site: ReadinessSite, ...ReadinessDatums, trees: z.array(ReadinessDto) });
export type SiteReadinessDto = z.infer<typeof SiteReadinessDto>;

/** GET /api/trees/:id/readiness: one tree against one site (by default its tank's target site). */
export const TreeReadinessDto = z.object({ site: ReadinessSite, ...ReadinessDatums, tree: ReadinessDto });
export type TreeReadinessDto = z.infer<typeof TreeReadinessDto>;
