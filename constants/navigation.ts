import { type Href } from 'expo-router';

import { type Role } from '@/shared/schemas/membership';

/** A section; `roles` narrows who sees it (the server refuses the rest anyway). */
export type NavItem = { key: string; label: string; href: Href; roles?: readonly Role[] };

/** The studio side's sections, in the order the navigation shows them. */
export const studioNav: readonly NavItem[] = [
  { key: 'overview', label: 'Overview', href: '/' },
  { key: 'works', label: 'Works', href: '/works' },
  { key: 'consignments', label: 'Consignments', href: '/consignments' },
  { key: 'venues', label: 'Venues', href: '/venues' },
  { key: 'mail', label: 'Sent mail', href: '/mail', roles: ['owner'] },
  { key: 'settings', label: 'Settings', href: '/settings' },
];

/** The sections a role sees. */
export function navFor(items: readonly NavItem[], role: Role): NavItem[] {
  return items.filter((item) => !item.roles || item.roles.includes(role));
}

/** A venue's sections. */
export const venueNav: readonly NavItem[] = [
  { key: 'consignments', label: 'Consignments', href: '/venue' },
];
