import { areaHref, homeArea, membershipFor, safeNextPath, signInHref } from '@/hooks/session';
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

const galleryElsewhere: Membership = {
  id: 3,
  studioId: 3,
  studioName: 'Fenwick Stoneware',
  role: 'gallery',
  venueId: 9,
  venueName: 'The Quay Gallery',
};

describe('membershipFor', () => {
  it('opens the venue side with the active membership when it is a venue’s', () => {
    expect(membershipFor(meWith([owner, gallery, galleryElsewhere], 3), 'venue')).toBe(
      galleryElsewhere,
    );
  });

  it('opens the venue side for venue staff whichever studio is active, or none', () => {
    // A scanned label of another maker opens without choosing that studio first.
    expect(membershipFor(meWith([owner, gallery], 1), 'venue')).toBe(gallery);
    expect(membershipFor(meWith([gallery, galleryElsewhere], null), 'venue')).toBe(gallery);
  });

  it('keeps the venue side shut to someone who works for no venue', () => {
    expect(membershipFor(meWith([owner], 1), 'venue')).toBeNull();
  });

  it('opens the studio side only with an owner’s or assistant’s membership in use', () => {
    expect(membershipFor(meWith([owner, gallery], 1), 'studio')).toBe(owner);
    expect(membershipFor(meWith([owner, gallery], 2), 'studio')).toBeNull();
    expect(membershipFor(meWith([owner, gallery], null), 'studio')).toBeNull();
  });
});

describe('safeNextPath', () => {
  it('keeps a path on this site', () => {
    expect(safeNextPath('/venue/piece/42')).toBe('/venue/piece/42');
    expect(safeNextPath('/consignments/3?tab=pieces')).toBe('/consignments/3?tab=pieces');
  });

  it.each([
    ['another site', 'https://evil.example/venue/piece/42'],
    ['a protocol-relative address, which leaves the site', '//evil.example/x'],
    ['a backslash, which browsers read as a slash', '/\\evil.example'],
    ['a script address', 'javascript:alert(1)'],
    ['a relative path', 'venue/piece/42'],
    ['a control character', '/venue\n/piece'],
    ['the sign-in page itself, which would go round in a circle', '/sign-in?next=/x'],
    ['nothing', undefined],
    ['a list of values', ['/venue']],
  ])('ignores %s', (_what, next) => {
    expect(safeNextPath(next)).toBeNull();
  });

  it('asks sign-in to come back to the page, except to a home page', () => {
    expect(signInHref('/venue/piece/42')).toEqual({
      pathname: '/sign-in',
      params: { next: '/venue/piece/42' },
    });
    expect(signInHref('/')).toBe('/sign-in');
    expect(signInHref('//evil.example')).toBe('/sign-in');
  });
});
