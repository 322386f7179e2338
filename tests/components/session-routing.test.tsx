import { areaHref, homeArea } from '@/hooks/session';
import { type Membership } from '@/shared/schemas/membership';
import { type Me } from '@/shared/schemas/session';

const owner: Membership = {
  id: 1,
  studioId: 1,
  studioName: 'Ash Lane Pottery',
  role: 'owner',
  venueId: null,
  venueName: null,
};
const gallery: Membership = {
  id: 2,
  studioId: 2,
  studioName: 'Holloway Ceramics',
  role: 'gallery',
  venueId: 7,
  venueName: 'The Quay Gallery',
};

function meWith(memberships: Membership[], activeMembershipId: number | null): Me {
  return {
    user: { id: 'u1', name: 'Ada Potter', email: 'ada@example.com' },
    memberships,
    activeMembershipId,
  };
}

describe('homeArea', () => {
  it('sends a signed-out visitor to sign in', () => {
    expect(areaHref(homeArea(null))).toBe('/sign-in');
  });

  it('asks someone with several memberships and none in use to choose one', () => {
    expect(areaHref(homeArea(meWith([owner, gallery], null)))).toBe('/choose-studio');
  });

  it('opens the studio side for an owner and the venue side for gallery staff', () => {
    expect(areaHref(homeArea(meWith([owner, gallery], 1)))).toBe('/');
    expect(areaHref(homeArea(meWith([owner, gallery], 2)))).toBe('/venue');
  });

  it('does not trust an active id that matches none of the memberships', () => {
    expect(homeArea(meWith([owner], 99))).toBe('choose-studio');
  });
});
