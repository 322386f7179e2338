import { type Href } from 'expo-router';

export type NavItem = { key: string; label: string; href: Href };

/** The studio side's sections, in the order the navigation shows them. */
export const studioNav: readonly NavItem[] = [
  { key: 'overview', label: 'Overview', href: '/' },
  { key: 'works', label: 'Works', href: '/works' },
  { key: 'venues', label: 'Venues', href: '/venues' },
  { key: 'settings', label: 'Settings', href: '/settings' },
];

/** A venue's sections. */
export const venueNav: readonly NavItem[] = [
  { key: 'consignments', label: 'Consignments', href: '/venue' },
];
