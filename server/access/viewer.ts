import { type Membership } from '@/shared/schemas/membership';
import { type User } from '@/shared/schemas/session';

/** The signed-in person behind a request, resolved once by `authenticate`. */
export type Viewer = {
  user: User;
  sessionId: string;
  memberships: Membership[];
  /** The membership this session works in; null until chosen when there are several. */
  active: Membership | null;
};

/**
 * What a query may touch: one studio, and for the gallery role one venue of it. Every
 * repository function over studio data takes a Scope, so an unscoped query has to be written on
 * purpose.
 */
export type Scope = {
  studioId: number;
  venueId: number | null;
  /** Who acts; null when nobody signed in does, as for the payment provider's webhook. */
  userId: string | null;
  role: Membership['role'];
};

export function scopeFor(viewer: Viewer & { active: Membership }): Scope {
  return {
    studioId: viewer.active.studioId,
    venueId: viewer.active.role === 'gallery' ? viewer.active.venueId : null,
    userId: viewer.user.id,
    role: viewer.active.role,
  };
}
