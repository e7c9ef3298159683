import type { CraftKind, CrewRole, Skill } from '@shared/schemas/crew.schema';

export const SKILLS: readonly Skill[] = ['paddler', 'boat-operator', 'first-aid', 'planting', 'nursery', 'photography'];

const SKILL_LABELS: Record<Skill, string> = {
  paddler: 'Confident paddler',
  'boat-operator': 'Can run a small boat',
  'first-aid': 'First aid certificate',
  planting: 'Planted mangroves before',
  nursery: 'Nursery work',
  photography: 'Photography',
};

export function skillLabel(skill: Skill): string {
  return SKILL_LABELS[skill];
}

export const CRAFT_KINDS: readonly CraftKind[] = ['sit-on-top-kayak', 'tandem-kayak', 'canoe', 'skiff', 'other'];

const CRAFT_LABELS: Record<CraftKind, string> = {
  'sit-on-top-kayak': 'Sit-on-top kayak',
  'tandem-kayak': 'Tandem kayak',
  canoe: 'Canoe',
  skiff: 'Skiff',
  other: 'Something else',
};

export function craftKindLabel(kind: CraftKind): string {
  return CRAFT_LABELS[kind];
}

/** What each role does on the day, in a line, for the sign-up's role step. */
const ROLE_HINTS: Record<CrewRole, string> = {
  'own-kayak': 'You bring and paddle your own kayak, ferrying people or pots out to the site.',
  seat: 'You paddle one of the program’s craft; no boat of your own needed.',
  operator: 'You run the program’s boat between the launch and the site.',
  shore: 'You stay at the launch: loading pots, handing out water, keeping the float plan.',
  planter: 'You wade the flats at the site and set the potted trees in place.',
};

export function crewRoleHint(role: CrewRole): string {
  return ROLE_HINTS[role];
}
