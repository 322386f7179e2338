import { execFileSync } from 'node:child_process';
import path from 'node:path';

import { formatDate } from '@/shared/format/dates';

describe('formatDate', () => {
  // Day, abbreviated month, year: the CLDR medium date of each locale, through Intl.
  it('writes a calendar day as the locale does', () => {
    expect(formatDate('2026-03-14', 'en-GB')).toBe('14 Mar 2026');
    expect(formatDate('2026-03-14', 'en-US')).toBe('Mar 14, 2026');
    expect(formatDate('2026-03-14', 'de-DE')).toBe('14. März 2026');
  });

  // Run in a plain Node process: jest's sandbox does not pass a change of TZ on to Intl.
  it('keeps the day whatever the machine’s time zone', () => {
    const module = path.resolve(__dirname, '../../../shared/format/dates.ts');
    // A fresh module for each zone, so no formatter made under another zone is reused.
    const script = `
      const days = {};
      for (const tz of ['Pacific/Kiritimati', 'America/Los_Angeles', 'Europe/London']) {
        process.env.TZ = tz;
        delete require.cache[${JSON.stringify(module)}];
        const { formatDate } = require(${JSON.stringify(module)});
        days[tz] = formatDate('2026-03-29', 'en-GB');
      }
      console.log(JSON.stringify(days));`;
    const out = execFileSync(process.execPath, ['--import', 'tsx', '-e', script], {
      encoding: 'utf8',
    });
    expect(JSON.parse(out)).toEqual({
      'Pacific/Kiritimati': '29 Mar 2026',
      'America/Los_Angeles': '29 Mar 2026',
      'Europe/London': '29 Mar 2026',
    });
  });
});
