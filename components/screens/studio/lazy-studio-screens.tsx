import { type ComponentType, lazy, Suspense } from 'react';

import { LoadingView } from '@/components/ui/status-views';

/**
 * One dynamic import for the whole studio side. Expo's web export moves any module that two route
 * chunks share into a common chunk that every page loads up front; reached through this single
 * import, the studio's screens and their dependencies stay in a chunk of their own, which the
 * sign-in page and the venue side never download.
 */
const loadStudioScreens = () => import('./studio-screens');

function lazyScreen<Props extends object>(pick: () => Promise<ComponentType<Props>>) {
  const Screen = lazy(async () => ({ default: await pick() }));
  return function LazyStudioScreen(props: Props) {
    return (
      <Suspense fallback={<LoadingView message="Opening the studio…" />}>
        <Screen {...props} />
      </Suspense>
    );
  };
}

export const BankImportScreen = lazyScreen(
  async () => (await loadStudioScreens()).BankImportScreen,
);
export const MailScreen = lazyScreen(async () => (await loadStudioScreens()).MailScreen);
export const MailMessageScreen = lazyScreen(
  async () => (await loadStudioScreens()).MailMessageScreen,
);
export const ConsignmentScreen = lazyScreen(
  async () => (await loadStudioScreens()).ConsignmentScreen,
);
export const ConsignmentCreateScreen = lazyScreen(
  async () => (await loadStudioScreens()).ConsignmentCreateScreen,
);
export const ConsignmentsScreen = lazyScreen(
  async () => (await loadStudioScreens()).ConsignmentsScreen,
);
export const MoreScreen = lazyScreen(async () => (await loadStudioScreens()).MoreScreen);
export const OverviewScreen = lazyScreen(async () => (await loadStudioScreens()).OverviewScreen);
export const SettingsScreen = lazyScreen(async () => (await loadStudioScreens()).SettingsScreen);
export const VenueScreen = lazyScreen(async () => (await loadStudioScreens()).VenueScreen);
export const VenueCreateScreen = lazyScreen(
  async () => (await loadStudioScreens()).VenueCreateScreen,
);
export const VenueEditScreen = lazyScreen(async () => (await loadStudioScreens()).VenueEditScreen);
export const VenuesScreen = lazyScreen(async () => (await loadStudioScreens()).VenuesScreen);
export const WorkScreen = lazyScreen(async () => (await loadStudioScreens()).WorkScreen);
export const WorkCreateScreen = lazyScreen(
  async () => (await loadStudioScreens()).WorkCreateScreen,
);
export const WorkEditScreen = lazyScreen(async () => (await loadStudioScreens()).WorkEditScreen);
export const WorkImportScreen = lazyScreen(
  async () => (await loadStudioScreens()).WorkImportScreen,
);
export const WorksScreen = lazyScreen(async () => (await loadStudioScreens()).WorksScreen);
export const StatementScreen = lazyScreen(async () => (await loadStudioScreens()).StatementScreen);
export const StatementsScreen = lazyScreen(
  async () => (await loadStudioScreens()).StatementsScreen,
);
export const YearScreen = lazyScreen(async () => (await loadStudioScreens()).YearScreen);
