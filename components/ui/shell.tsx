import { Link, usePathname } from 'expo-router';
import { type ReactNode } from 'react';
import { Pressable, type PressableProps, StyleSheet, View } from 'react-native';

import { barFor, moreNavItem, type NavItem, underMore } from '@/constants/navigation';
import { palette, radii, spacing, touchTarget } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useSignOutMutation } from '@/hooks/session';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { type Membership } from '@/shared/schemas/membership';
import { type Me } from '@/shared/schemas/session';

import { Button } from './button';
import { Notice } from './notice';
import { Text } from './text';
import { ToastProvider } from './toast';
import { focusRing, useFocusRing } from './use-focus-ring';
import { webAria } from './web-aria';

type ShellProps = {
  nav: readonly NavItem[];
  me: Me;
  membership: Membership;
  children: ReactNode;
};

const targetOf = (href: NavItem['href']) => (typeof href === 'string' ? href : href.pathname);

function matches(pathname: string, href: NavItem['href']): boolean {
  const target = targetOf(href);
  return target === '/'
    ? pathname === '/'
    : pathname === target || pathname.startsWith(`${target}/`);
}

/** The section a page is in: the one whose address is the longest start of the page's. */
function isCurrent(pathname: string, href: NavItem['href'], nav: readonly NavItem[]): boolean {
  if (!matches(pathname, href)) return false;
  const length = targetOf(href).length;
  return !nav.some(
    (other) => targetOf(other.href).length > length && matches(pathname, other.href),
  );
}

/** In the bottom bar, More stands for the sections under it. */
function isCurrentInBar(pathname: string, item: NavItem, nav: readonly NavItem[]): boolean {
  if (item.key !== moreNavItem.key) return isCurrent(pathname, item.href, nav);
  return [item, ...underMore(nav)].some((under) => isCurrent(pathname, under.href, nav));
}

type NavPressableProps = Omit<PressableProps, 'style' | 'children'> & {
  item: NavItem;
  current: boolean;
  layout: 'side' | 'tab';
};

/**
 * The pressable inside a nav Link. A component of its own because Link's slot merges its child's
 * `style` as a plain object, which would drop a style function or array.
 */
function NavPressable({ item, current, layout, ...props }: NavPressableProps) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      testID={`nav-${item.key}`}
      role="link"
      accessibilityState={{ selected: current }}
      {...webAria({ 'aria-current': current ? 'page' : undefined })}
      {...focusProps}
      {...props}
      style={({ pressed }) => [
        layout === 'side' ? styles.sideLink : styles.tabLink,
        current && styles.linkCurrent,
        pressed && styles.linkPressed,
        focused && focusRing,
      ]}
    >
      <View
        testID={current ? `nav-${item.key}-current` : undefined}
        style={[layout === 'side' ? styles.sideBar : styles.tabBarMark, current && styles.markOn]}
      />
      <Text variant={current ? 'bodyStrong' : 'body'} numberOfLines={1}>
        {item.label}
      </Text>
    </Pressable>
  );
}

/** One section link; the current one is marked by weight, a bar and `aria-current`, not colour alone. */
function NavLink(props: Omit<NavPressableProps, keyof PressableProps>) {
  return (
    // A section is gone back to where it is already open, so sections never stack up.
    <Link href={props.item.href} asChild dismissTo>
      <NavPressable {...props} />
    </Link>
  );
}

function placeLine(membership: Membership): string {
  return membership.role === 'gallery' && membership.venueName
    ? `${membership.venueName} · work from ${membership.studioName}`
    : membership.studioName;
}

/** The frame around every signed-in screen: side navigation when wide, a bottom bar on a phone. */
export function Shell({ nav, me, membership, children }: ShellProps) {
  const { wide } = useBreakpoint();
  const pathname = usePathname();
  const signOut = useSignOutMutation();
  const canSwitch = me.memberships.length > 1;

  const signOutButton = (
    <Button
      testID="sign-out"
      label="Sign out"
      busyLabel="Signing out…"
      busy={signOut.isPending}
      variant={wide ? 'secondary' : 'quiet'}
      onPress={() => signOut.mutate()}
    />
  );
  const switchLink = canSwitch ? (
    <Link href="/choose-studio" asChild>
      <Button testID="change-studio" label="Change studio" variant="quiet" />
    </Link>
  ) : null;
  const problem = signOut.isError ? <Notice message={errorMessage(signOut.error)} /> : null;
  const links = (wide ? nav : barFor(nav)).map((item) => (
    <NavLink
      key={item.key}
      item={item}
      current={wide ? isCurrent(pathname, item.href, nav) : isCurrentInBar(pathname, item, nav)}
      layout={wide ? 'side' : 'tab'}
    />
  ));

  if (wide) {
    return (
      <View testID="shell-wide" style={styles.wide}>
        <View role="navigation" testID="side-nav" style={styles.side}>
          <Text variant="title">Saggar</Text>
          <View style={styles.who}>
            <Text variant="bodyStrong">{placeLine(membership)}</Text>
            <Text variant="small">{me.user.name}</Text>
          </View>
          <View style={styles.sideLinks}>{links}</View>
          <View style={styles.spacer} />
          {switchLink}
          {signOutButton}
          {problem}
        </View>
        <View style={styles.content}>
          <ToastProvider>{children}</ToastProvider>
        </View>
      </View>
    );
  }

  return (
    <View testID="shell-narrow" style={styles.narrow}>
      <View role="banner" style={styles.header}>
        {/*
          The venue alone on a phone, "· work from …" left out. The name has the header's whole
          width, the buttons going on the line below, so a long one wraps to two lines instead of
          being cut off beside them.
        */}
        <Text variant="bodyStrong" numberOfLines={2} testID="shell-place">
          {membership.venueName ?? membership.studioName}
        </Text>
        <View style={styles.headerRow}>
          <Text variant="small" numberOfLines={1} style={styles.headerText}>
            {me.user.name}
          </Text>
          {switchLink}
          {signOutButton}
        </View>
      </View>
      {problem}
      <View style={styles.content}>
        <ToastProvider>{children}</ToastProvider>
      </View>
      <View role="navigation" testID="bottom-bar" style={styles.tabBar}>
        {links}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flex: 1, flexDirection: 'row', backgroundColor: palette.paper },
  side: {
    width: 256,
    padding: spacing.xl,
    gap: spacing.lg,
    backgroundColor: palette.sunken,
    borderRightWidth: 1,
    borderRightColor: palette.hairline,
  },
  who: { gap: spacing.xxs },
  sideLinks: { gap: spacing.xs, marginTop: spacing.sm },
  spacer: { flex: 1 },
  sideLink: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingRight: spacing.md,
    borderRadius: radii.md,
  },
  sideBar: {
    width: 4,
    alignSelf: 'stretch',
    borderRadius: radii.sm,
    backgroundColor: 'transparent',
  },
  linkCurrent: { backgroundColor: palette.accentSoft },
  linkPressed: { opacity: 0.85 },
  markOn: { backgroundColor: palette.accent },
  content: { flex: 1 },
  narrow: { flex: 1, backgroundColor: palette.paper },
  header: {
    paddingHorizontal: spacing.lg,
    paddingTop: spacing.sm,
    backgroundColor: palette.sunken,
    borderBottomWidth: 1,
    borderBottomColor: palette.hairline,
  },
  headerRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  headerText: { flex: 1 },
  tabBar: {
    flexDirection: 'row',
    backgroundColor: palette.surface,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  // Each entry as wide as its word needs, the room left shared out: "Consignments" fits at 390 px.
  tabLink: {
    flexGrow: 1,
    flexShrink: 1,
    flexBasis: 'auto',
    paddingHorizontal: spacing.xs,
    minHeight: 56,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.xs,
  },
  tabBarMark: {
    position: 'absolute',
    top: 0,
    left: spacing.xl,
    right: spacing.xl,
    height: 4,
    borderBottomLeftRadius: radii.sm,
    borderBottomRightRadius: radii.sm,
    backgroundColor: 'transparent',
  },
});
