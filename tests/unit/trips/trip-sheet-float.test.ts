import { describe, expect, it } from 'vitest';
import { buildFloatPlan } from '../../../server/domain/trips/trip-sheet-float.js';
import { allText, sectionLines, sheetInput } from './trip-sheet-fixture.js';

/**
 * Content follows TRADE.md §2: the USCG float plan form (vessels, people, route, departure and
 * return times, when to call for help), left with a reliable person and not filed with the
 * Coast Guard; one wearable life jacket per person (33 CFR 175.15); head for shore at the first
 * thunder (common practice) and wait 30 minutes after the last (NWS lightning guidance).
 */
describe('buildFloatPlan', () => {
  it('is a float plan for the shore contact, dated, with the organisation on every page', () => {
    const sheet = buildFloatPlan(sheetInput());
    expect(sheet).toMatchObject({ title: 'Float plan', organisation: 'Test Shoreline Trust', fileName: 'float-plan-2026-04-10.pdf', paper: 'LETTER' });
    expect(sectionLines(sheet, 'For the shore contact').join(' ')).toMatch(/reliable person ashore.*not filed with the Coast Guard/);
  });

  it('gives the organisation and the coordinator to call, with a blank for the shore contact', () => {
    expect(sectionLines(buildFloatPlan(sheetInput()), 'Who to call')).toEqual([
      'Shore contact: ______________ (name)   phone ______________',
      'Organisation: Test Shoreline Trust, hello@shoreline.example',
      'Coordinator: Cora Lane, phone 727-555-0100, cora@shoreline.example',
    ]);
  });

  it('leaves a blank for a coordinator phone that is not on record', () => {
    const input = sheetInput({ coordinator: { name: 'Cora Lane', email: 'cora@shoreline.example', phone: null } });
    expect(sectionLines(buildFloatPlan(input), 'Who to call')).toContain('Coordinator: Cora Lane, phone ______________, cora@shoreline.example');
  });

  it('states the route, the departure and the latest return in the zone', () => {
    expect(sectionLines(buildFloatPlan(sheetInput()), 'The trip')).toEqual([
      'Date: Friday, April 10, 2026',
      'Route: from Mill Creek ramp to Heron Point, 0.43 nmi each way',
      'Low-water window: 9:00 AM – 12:00 PM EDT',
      'First departure: 9:00 AM EDT',
      'Latest return: 12:12 PM EDT (planned, last craft back at the launch)',
      'On the water: 4 people in 2 craft',
    ]);
  });

  it('says what to do when the party is overdue, with blanks to fill in', () => {
    const steps = sectionLines(buildFloatPlan(sheetInput()), 'If the party is overdue');
    expect(steps[0]).toBe('Call ______________ if not back by ______________. Planned latest return: 12:12 PM EDT. Start with the coordinator, Cora Lane (phone 727-555-0100).');
    expect(steps[1]).toMatch(/call the Coast Guard or local emergency services on ______________/);
    expect(steps.join(' ')).toMatch(/Read them this plan/);
  });

  it('describes each craft so a searcher could recognise it, leaving the colour blank when not recorded', () => {
    const sheet = buildFloatPlan(sheetInput());
    expect(sectionLines(sheet, 'Heron')).toEqual([
      'Description: "Heron", canoe, 2 seats',
      'Colour: ______________ (not recorded: fill in)',
      'Notes: green hull',
      'Run | Departs (EDT) | Back by (EDT) | Aboard on the way out',
      '1 | 9:00 AM | 9:29 AM | Ann Ortiz, Mia Ortiz',
      '2 | 9:39 AM | 12:12 PM | Ben Shaw',
    ]);
    expect(sectionLines(sheet, "Kai Reyes's own sit-on-top kayak")).toContain('Owner: Kai Reyes');
    // The idle skiff stays ashore, so it is not described as out on the water.
    expect(sheet.sections.map((s) => s.heading)).not.toContain('Pelican');
  });

  it('prints a recorded colour', () => {
    const input = sheetInput();
    input.craft = input.craft.map((c) => (c.id === 'heron' ? { ...c, colour: 'dark green' } : c));
    expect(sectionLines(buildFloatPlan(input), 'Heron')).toContain('Colour: dark green');
  });

  it('lists everyone on the water with phone, emergency contact or guardian, and the run they ride out on', () => {
    const people = sectionLines(buildFloatPlan(sheetInput()), 'People on the water');
    expect(people).toEqual([
      'Name | Phone | Emergency contact | Rides out on',
      'Ann Ortiz | 727-555-0111 | Raul Ortiz, 727-555-0112 | Heron, run 1',
      'Mia Ortiz (minor) |  | guardian Ann Ortiz, 727-555-0111 | Heron, run 1',
      "Kai Reyes | 727-555-0133 | none on record | Kai Reyes's own sit-on-top kayak, run 1",
      'Ben Shaw |  | Lee Shaw, 727-555-0122 | Heron, run 2',
      'Left ashore by the plan (not on the water): Zoe Park.',
      'Private: contact details are for the shore contact and the coordinator only.',
    ]);
  });

  it('names nobody as left ashore when the plan places everyone', () => {
    const input = sheetInput();
    input.plan.unplaced.people = [];
    expect(sectionLines(buildFloatPlan(input), 'People on the water').join('\n')).not.toMatch(/Left ashore/);
  });

  it('carries the cautions and the note that local rules and the operator prevail', () => {
    const text = allText(buildFloatPlan(sheetInput()));
    for (const caution of [/wearable life jacket for everyone on the water/, /first thunder/, /30 minutes after the last thunder/, /Heat/, /oyster shell/]) expect(text).toMatch(caution);
    expect(text).toContain("Local rules, permits and the licensed operator's judgement prevail over this plan.");
  });
});
