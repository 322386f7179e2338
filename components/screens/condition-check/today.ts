import { isoDateInTimeZone } from '@/shared/money/calendar';

/** Today where the person is, as a date a check is dated with. */
export const today = () =>
  isoDateInTimeZone(new Date(), Intl.DateTimeFormat().resolvedOptions().timeZone);
