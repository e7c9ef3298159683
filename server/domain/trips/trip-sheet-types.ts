/**
 * The printable trip sheet and float plan: what goes in (a stored plan with the craft, people
 * and organisation behind it) and what comes out (sections of blocks any renderer can draw).
 */
import type { LengthUnit } from '../../../shared/schemas/organisation.schema.js';
import type { TripInstanceJson, TripPlanJson } from './api.js';
import type { CraftKind } from './types.js';

export interface SheetOrganisation {
  name: string;
  contactEmail: string;
  units: LengthUnit;
  timeZone: string;
}

/** A craft of the plan as the fleet (or a sign-up, for a volunteer's own kayak) describes it. */
export interface SheetCraft {
  id: string;
  /** Null for a volunteer's own kayak, which has no fleet name. */
  name: string | null;
  kind: CraftKind;
  seats: number;
  maxLoadKg: number;
  /** The rated maximum is a capacity plate (true) or the maker's rating (false). */
  hasCapacityPlate: boolean;
  potSlots: number;
  needsOperator: boolean;
  draftM: number | null;
  /** Not recorded today: the float plan leaves a blank to fill in. */
  colour: string | null;
  notes: string;
  /** Owner's name, for a volunteer's own kayak. */
  ownerName: string | null;
}

export interface PhoneContact {
  name: string;
  phone: string;
}

/** A person of the plan; contacts are private (coordinators only). */
export interface SheetPerson {
  id: string;
  name: string;
  phone: string | null;
  emergencyContact: PhoneContact | null;
  minor: boolean;
  /** A minor's guardian: a crew member (phone may be null) or the details given at sign-up. */
  guardian: { name: string; phone: string | null } | null;
}

export interface SheetContact {
  name: string;
  email: string;
  phone: string | null;
}

export interface TripSheetInput {
  organisation: SheetOrganisation;
  workday: { title: string; siteName: string; launchName: string; meetingPoint: string };
  /** The coordinator the shore contact calls first. */
  coordinator: SheetContact;
  instance: TripInstanceJson;
  plan: TripPlanJson;
  source: 'solver' | 'edited';
  /** When the stored plan last changed, epoch ms. */
  planUpdatedAt: number;
  craft: readonly SheetCraft[];
  people: readonly SheetPerson[];
}

export interface SheetColumn {
  label: string;
  /** Share of the line width; a table's shares add up to 1. */
  width: number;
}

export type SheetBlock =
  | { kind: 'facts'; rows: { label: string; value: string }[] }
  | { kind: 'table'; columns: SheetColumn[]; rows: string[][]; empty: string }
  | { kind: 'paragraph'; text: string; strong?: boolean }
  | { kind: 'list'; items: string[]; numbered?: boolean };

export interface SheetSection {
  heading: string;
  blocks: SheetBlock[];
}

/** A document ready to print: every page carries the organisation and title; pages are numbered. */
export interface PrintableSheet {
  title: string;
  organisation: string;
  /** Under the title on the first page. */
  subtitle: string;
  /** Beside the page number on every page. */
  footer: string;
  fileName: string;
  /** Letter where the organisation works in feet (US), A4 where it works in metres. */
  paper: 'LETTER' | 'A4';
  sections: SheetSection[];
}
