import { Slot } from 'expo-router';
import { act, renderRouter, screen } from 'expo-router/testing-library';
import { Dimensions, Text } from 'react-native';

import { Shell } from '@/components/ui/shell';
import { studioNav } from '@/constants/navigation';
import { type Me } from '@/shared/schemas/session';

import { TestQueryProvider } from './test-query-client';

const me: Me = {
  user: { id: 'u1', name: 'Ada Potter', email: 'ada@example.com' },
  memberships: [
    {
      id: 1,
      studioId: 1,
      studioName: 'Ash Lane Pottery',
      role: 'owner',
      venueId: null,
      venueName: null,
    },
  ],
  activeMembershipId: 1,
};

function setWidth(width: number) {
  act(() => {
    Dimensions.set({
      window: { width, height: 800, scale: 1, fontScale: 1 },
      screen: { width, height: 800, scale: 1, fontScale: 1 },
    });
  });
}

function renderShell(initialUrl = '/') {
  const membership = me.memberships[0]!;
  return renderRouter(
    {
      _layout: () => (
        <TestQueryProvider>
          <Shell nav={studioNav} me={me} membership={membership}>
            <Slot />
          </Shell>
        </TestQueryProvider>
      ),
      index: () => <Text>Overview body</Text>,
      settings: () => <Text>Settings body</Text>,
    },
    { initialUrl },
  );
}

describe('Shell', () => {
  it('shows a bottom bar on a phone, with the current section marked', () => {
    setWidth(390);
    renderShell();

    expect(screen.getByTestId('bottom-bar')).toBeTruthy();
    expect(screen.queryByTestId('side-nav')).toBeNull();
    expect(screen.getByTestId('nav-overview-current')).toBeTruthy();
    expect(screen.getByTestId('sign-out')).toHaveTextContent('Sign out');
    expect(screen.getByText('Ash Lane Pottery')).toBeTruthy();
    expect(screen.getByText('Overview body')).toBeTruthy();
  });

  it('keeps Sent mail and Settings under More on a phone, and marks More while one is open', () => {
    setWidth(390);
    renderShell('/settings');
    const bar = ['nav-overview', 'nav-works', 'nav-consignments', 'nav-venues', 'nav-more'];
    for (const id of bar) expect(screen.getByTestId(id)).toBeTruthy();
    expect(screen.queryByTestId('nav-mail')).toBeNull();
    expect(screen.queryByTestId('nav-settings')).toBeNull();
    expect(screen.getByTestId('nav-more-current')).toBeTruthy();
  });

  it('shows a side navigation from 768 px wide', () => {
    setWidth(768);
    renderShell();

    expect(screen.getByTestId('side-nav')).toBeTruthy();
    expect(screen.queryByTestId('bottom-bar')).toBeNull();
    expect(screen.getByTestId('nav-overview')).toHaveTextContent('Overview');
    // Wide, every section has its own entry.
    expect(screen.getByTestId('nav-settings')).toHaveTextContent('Settings');
    expect(screen.queryByTestId('nav-more')).toBeNull();
    expect(screen.getByText('Ada Potter')).toBeTruthy();
  });

  it('switches between the two when the window is resized', () => {
    setWidth(1024);
    renderShell();
    expect(screen.getByTestId('shell-wide')).toBeTruthy();

    setWidth(767);
    expect(screen.getByTestId('shell-narrow')).toBeTruthy();
    expect(screen.queryByTestId('shell-wide')).toBeNull();
  });
});
