import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { type Href, usePathname } from 'expo-router';
import { useState } from 'react';

import { type Membership } from '@/shared/schemas/membership';
import { type Me, meSchema, type SignIn } from '@/shared/schemas/session';

import { apiRequest } from './api-client';
import { ApiError } from './api-errors';
import { staleTimes } from './query-config';

export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
};

/** Everything cached outside the session belongs to one membership; drop it when that changes. */
function dropMembershipData(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.all[0] });
}

async function fetchMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    return await apiRequest('/api/me', { schema: meSchema, signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

/** Who is signed in; `null` when nobody is (a 401 is an answer here, not a failure). */
export function useMeQuery() {
  return useQuery({
    queryKey: sessionKeys.me(),
    queryFn: ({ signal }) => fetchMe(signal),
    staleTime: staleTimes.session,
  });
}

export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (values: SignIn) =>
      apiRequest('/api/auth/sign-in/email', { method: 'POST', body: values }),
    onSuccess: async () => {
      dropMembershipData(queryClient);
      // Wait for the new session, so guards never act on the cached "signed out".
      await queryClient.invalidateQueries({ queryKey: sessionKeys.all, refetchType: 'all' });
    },
  });
}

export function useSignOutMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest('/api/auth/sign-out', { method: 'POST', body: {} }),
    onSuccess: () => {
      dropMembershipData(queryClient);
      queryClient.setQueryData(sessionKeys.me(), null);
    },
  });
}

export function useActiveMembershipMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (membershipId: number) =>
      apiRequest('/api/me/active-membership', {
        method: 'PUT',
        body: { membershipId },
        schema: meSchema,
      }),
    onSuccess: (me) => {
      dropMembershipData(queryClient);
      queryClient.setQueryData(sessionKeys.me(), me);
    },
  });
}

export function activeMembership(me: Me): Membership | null {
  return me.memberships.find((membership) => membership.id === me.activeMembershipId) ?? null;
}

/** The role of the membership in use, once known; the server checks it again on every request. */
export function useActiveRole(): Membership['role'] | undefined {
  const me = useMeQuery();
  return me.data ? activeMembership(me.data)?.role : undefined;
}

export type Area = 'sign-in' | 'choose-studio' | 'studio' | 'venue';

const areaHrefs = {
  'sign-in': '/sign-in',
  'choose-studio': '/choose-studio',
  studio: '/',
  venue: '/venue',
} as const satisfies Record<Area, Href>;

/** Where a person belongs: signed out, still to choose, on the studio side or a venue's. */
export function homeArea(me: Me | null): Area {
  if (me === null) return 'sign-in';
  const membership = activeMembership(me);
  if (membership === null) return 'choose-studio';
  return membership.role === 'gallery' ? 'venue' : 'studio';
}

export function areaHref(area: Area): Href {
  return areaHrefs[area];
}

type Waiting =
  | { status: 'loading' }
  | { status: 'error'; error: unknown; retry: () => void }
  | { status: 'redirect'; href: Href };

/** A guard's verdict: wait, show the problem, send elsewhere, or open with what it found. */
export type Gate<Ready extends object = object> = Waiting | ({ status: 'ready' } & Ready);
export type GateWaiting = Waiting;

function useGate<Ready extends object>(decide: (me: Me | null) => Gate<Ready>): Gate<Ready> {
  const query = useMeQuery();
  if (query.isPending) return { status: 'loading' };
  if (query.isError) return { status: 'error', error: query.error, retry: () => query.refetch() };
  return decide(query.data);
}

/**
 * A page to go back to after signing in, only if it is a path on this site: it starts with one
 * "/" (never "//" or "/\\", which a browser reads as another host), holds no control characters,
 * and is not the sign-in page itself. Anything else is ignored.
 */
export function safeNextPath(next: unknown): string | null {
  if (typeof next !== 'string' || next.length > 2000) return null;
  if (!next.startsWith('/') || next.startsWith('//')) return null;

  if (/[\u0000-\u001f\u007f\\]/.test(next)) return null;
  if (next === '/sign-in' || next.startsWith('/sign-in?') || next.startsWith('/sign-in/')) {
    return null;
  }
  return next;
}

/** Sign-in, remembering the page to come back to (the home pages need no reminder). */
export function signInHref(next?: string | null): Href {
  const path = safeNextPath(next);
  return path === null || path === '/' || path === '/venue'
    ? '/sign-in'
    : { pathname: '/sign-in', params: { next: path } };
}

/**
 * Sign-in opens only when signed out; choosing a studio only when signed in. Once signed in,
 * sign-in goes on to `next` when it is a safe path on this site, otherwise home. The client only
 * hides what the server would refuse; the server checks every request again.
 */
export function useSessionGate(area: 'sign-in' | 'choose-studio', next?: unknown): Gate {
  return useGate((me) => {
    const home = homeArea(me);
    const allowed = area === 'sign-in' ? home === 'sign-in' : me !== null;
    if (allowed) return { status: 'ready' };
    const path = area === 'sign-in' ? safeNextPath(next) : null;
    return { status: 'redirect', href: path === null ? areaHref(home) : (path as Href) };
  });
}

/**
 * The membership a side opens with. The studio side: the active membership, when it is an owner's
 * or an assistant's. The venue side: the active one when it is a venue's staff, otherwise any
 * venue membership, so a scanned label opens whichever studio is active (the server scopes each
 * piece by its own studio).
 */
export function membershipFor(me: Me, area: 'studio' | 'venue'): Membership | null {
  const active = activeMembership(me);
  if (area === 'studio') return active !== null && active.role !== 'gallery' ? active : null;
  if (active?.role === 'gallery') return active;
  return me.memberships.find((membership) => membership.role === 'gallery') ?? null;
}

/**
 * The path a guarded layout was opened at. While its gate waits, the layout renders no navigator
 * and Expo Router then reports the group's root instead (a scanned `/venue/piece/42` reads as
 * `/venue`): so the path is the one of the first render, or of the last render with the side open.
 */
function useAskedPath(open: boolean): string {
  const pathname = usePathname();
  const [asked, setAsked] = useState(pathname);
  // Kept from an earlier render, as React's guide on state from previous renders does.
  if (open && pathname !== asked) setAsked(pathname);
  return open ? pathname : asked;
}

/**
 * The studio side opens for owners and assistants, the venue side for anyone who works for a
 * venue. Signed out, both send to sign-in with the page asked for, to come back to it.
 */
export function useMembershipGate(
  area: 'studio' | 'venue',
): Gate<{ me: Me; membership: Membership }> {
  const me = useMeQuery();
  const path = useAskedPath(me.data !== undefined && me.data !== null);
  return useGate<{ me: Me; membership: Membership }>((me) => {
    if (me === null) return { status: 'redirect', href: signInHref(path) };
    const membership = membershipFor(me, area);
    if (membership === null) return { status: 'redirect', href: areaHref(homeArea(me)) };
    return { status: 'ready', me, membership };
  });
}
