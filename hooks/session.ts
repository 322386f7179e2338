import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { type Href } from 'expo-router';

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
 * Sign-in opens only when signed out; choosing a studio only when signed in. The client only
 * hides what the server would refuse; the server checks every request again.
 */
export function useSessionGate(area: 'sign-in' | 'choose-studio'): Gate {
  return useGate((me) => {
    const home = homeArea(me);
    const allowed = area === 'sign-in' ? home === 'sign-in' : me !== null;
    return allowed ? { status: 'ready' } : { status: 'redirect', href: areaHref(home) };
  });
}

/** The studio side opens for owners and assistants, the venue side for gallery staff. */
export function useMembershipGate(
  area: 'studio' | 'venue',
): Gate<{ me: Me; membership: Membership }> {
  return useGate<{ me: Me; membership: Membership }>((me) => {
    const membership = me === null ? null : activeMembership(me);
    if (me === null || membership === null || homeArea(me) !== area) {
      return { status: 'redirect', href: areaHref(homeArea(me)) };
    }
    return { status: 'ready', me, membership };
  });
}
