import { describe, expect, it } from 'vitest';
import { buildNavMenu, FLAT_MENU_LIMIT, isUnderNavPath, type NavEntry, type NavItem } from '@/composables/useNavItems';

function shape(entries: NavEntry[]): (string | [string, string[]])[] {
  return entries.map((entry) => (entry.kind === 'link' ? entry.item.label : [entry.group.label, entry.group.items.map((item) => item.label)]));
}

const longMenu: NavItem[] = [
  { name: 'home', label: 'Home' },
  { name: 'workday-calendar', label: 'Workday calendar', group: 'workdays' },
  { name: 'sites', label: 'Sites', group: 'tides' },
  { name: 'nursery', label: 'Nursery ledger', group: 'nursery' },
  { name: 'sponsor-campaigns', label: 'Sponsor a tree', group: 'giving' },
  { name: 'fleet', label: 'Fleet', group: 'workdays' },
  { name: 'people', label: 'People', group: 'organisation' },
  { name: 'reports', label: 'Reports', group: 'giving' },
  { name: 'account', label: 'My account', group: 'account' },
];

describe('buildNavMenu', () => {
  it('groups a long menu, each group where its first item stands, and sets account items apart', () => {
    const menu = buildNavMenu(longMenu);
    expect(shape(menu.entries)).toEqual([
      'Home',
      ['Workdays', ['Workday calendar', 'Fleet']],
      ['Tides & sites', ['Sites']],
      ['Nursery', ['Nursery ledger']],
      ['Giving & reports', ['Sponsor a tree', 'Reports']],
      ['Organisation', ['People']],
    ]);
    expect(menu.account.map((item) => item.label)).toEqual(['My account']);
  });

  it(`keeps up to ${FLAT_MENU_LIMIT} items flat, in their order`, () => {
    const items = longMenu.slice(0, FLAT_MENU_LIMIT);
    expect(shape(buildNavMenu([...items, longMenu[8]!]).entries)).toEqual(items.map((item) => item.label));
  });

  it('puts a newly inserted item into its group, and one without a group on its own', () => {
    const items: NavItem[] = [...longMenu, { name: 'campaigns-admin', label: 'Campaigns', group: 'giving' }, { name: 'my-hours', label: 'My hours' }];
    expect(shape(buildNavMenu(items).entries).slice(-3)).toEqual([
      ['Giving & reports', ['Sponsor a tree', 'Reports', 'Campaigns']],
      ['Organisation', ['People']],
      'My hours',
    ]);
  });
});

describe('isUnderNavPath', () => {
  it.each([
    ['/sites', '/sites', true],
    ['/sites/4/edit', '/sites', true],
    ['/sitesmap', '/sites', false],
    ['/sites', '/', false],
    ['/', '/', true],
  ])('%s is under %s: %s', (current, item, expected) => {
    expect(isUnderNavPath(current, item)).toBe(expected);
  });
});
