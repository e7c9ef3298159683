import { z } from 'zod';

/** Stages of a tree, in order; a tree may end `lost` from any stage. */
export const TreeStage = z.enum(['collected', 'tube', 'potted', 'brining', 'ready', 'planted', 'alive', 'lost']);
export type TreeStage = z.infer<typeof TreeStage>;

export const SalinityMethod = z.enum(['refractometer', 'hydrometer']);
export type SalinityMethod = z.infer<typeof SalinityMethod>;

/** How readiness is judged; organisation settings. */
export const NurseryRules = z.object({
  /** 'mhhw': the tree top must stand above MHHW; 'share': submerged at most `maxCrownSubmergedShare` of hours. */
  crownRule: z.enum(['mhhw', 'share']),
  maxCrownSubmergedShare: z.number().min(0).max(0.5),
  salinityTolerancePpt: z.number().min(0.5).max(10),
  holdDays: z.number().int().min(1).max(120),
});
export type NurseryRules = z.infer<typeof NurseryRules>;

export const DEFAULT_NURSERY_RULES: NurseryRules = { crownRule: 'mhhw', maxCrownSubmergedShare: 0.02, salinityTolerancePpt: 2, holdDays: 21 };
