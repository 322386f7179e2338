import { type Href } from 'expo-router';

import { type Role } from '@/shared/schemas/membership';

/**
 * A section; `roles` narrows who sees it (the server refuses the rest anyway). `inBar: false`
 * keeps it out of a phone's bottom bar, where it is one tap further, under More.
 */
export type NavItem = {
  key: string;
  label: string;
  href: Href;
  roles?: readonly Role[];
  inBar?: boolean;
};

/** The studio side's sections, in the order the navigation shows them. */
export const studioNav: readonly NavItem[] = [
  { key: 'overview', label: 'Overview', href: '/' },
  { key: 'works', label: 'Works', href: '/works' },
  { key: 'consignments', label: 'Consignments', href: '/consignments' },
  { key: 'venues', label: 'Venues', href: '/venues' },
  { key: 'statements', label: 'Statements', href: '/statements', inBar: false },
  { key: 'year', label: 'The year', href: '/year', roles: ['owner'], inBar: false },
  { key: 'mail', label: 'Sent mail', href: '/mail', roles: ['owner'], inBar: false },
  { key: 'settings', label: 'Settings', href: '/settings', inBar: false },
];

/** On a phone, the bottom bar's last entry: the page listing the sections left out of it. */
export const moreNavItem: NavItem = { key: 'more', label: 'More', href: '/more' };

/** A phone's bottom bar: the sections that fit, then More when some do not. */
export function barFor(items: readonly NavItem[]): NavItem[] {
  const inBar = items.filter((item) => item.inBar !== false);
  return inBar.length === items.length ? inBar : [...inBar, moreNavItem];
}

/** The sections under More. */
export const underMore = (items: readonly NavItem[]) =>
  items.filter((item) => item.inBar === false);

/** The sections a role sees. */
export function navFor(items: readonly NavItem[], role: Role): NavItem[] {
  return items.filter((item) => !item.roles || item.roles.includes(role));
}

/** A venue's sections: the counter list, which holds the consignments too, and statements. */
export const venueNav: readonly NavItem[] = [
  { key: 'counter', label: 'Counter', href: '/venue' },
  { key: 'venue-statements', label: 'Statements', href: '/venue/statements' },
];
