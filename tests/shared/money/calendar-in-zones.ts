// Run by calendar.test.ts in a child process: jest gives each test a copy of process.env, so
// setting TZ there changes nothing, while here Node applies it to every later Date. Prints, for
// each zone given, what the calendar says about each date given.
import { addDays, addMonths, daysBetween, endOfMonth } from '@/shared/money';

const [zones, dates] = JSON.parse(process.argv[2] ?? '[[], []]') as [string[], string[]];
const answers: Record<string, unknown[]> = {};
for (const zone of zones) {
  process.env.TZ = zone;
  answers[zone] = dates.map((date) => [
    addDays(date, 1),
    addDays(date, -1),
    daysBetween(date, '2030-01-01'),
    addMonths(date, 1),
    endOfMonth(date),
  ]);
}
process.stdout.write(JSON.stringify(answers));
