import path from 'node:path';

import { ESLint } from 'eslint';

const root = path.resolve(__dirname, '../..');
// The project's own config, handed over directly: jest cannot run ESLint's dynamic config import.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const config = require(path.join(root, 'eslint.config.js'));
const eslint = new ESLint({ cwd: root, overrideConfigFile: true, overrideConfig: config });

/** The rule ids ESLint reports for `code` as if it were the file at `file`. */
async function brokenRules(file: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: path.join(root, file) });
  return (result?.messages ?? []).map((m) => m.ruleId ?? 'parse-error');
}

// The layer rules the README states, kept by the lint (eslint.config.js).
describe('the lint keeps the layers', () => {
  it('refuses Kysely and the scoped builders in routers and services', async () => {
    expect(
      await brokenRules(
        'server/works/example.service.ts',
        "import { sql } from 'kysely';\nexport const q = sql`1`;\n",
      ),
    ).toContain('no-restricted-imports');
    expect(
      await brokenRules(
        'server/works/example.router.ts',
        "import { scoped } from '../access/scoped';\nexport const s = scoped;\n",
      ),
    ).toContain('no-restricted-imports');
  });

  it('refuses HTTP errors in repositories', async () => {
    expect(
      await brokenRules(
        'server/works/example.repository.ts',
        "import { HttpError } from '../http/http-error';\nexport const e = HttpError;\n",
      ),
    ).toContain('no-restricted-imports');
  });

  it('refuses the API client and fetch in screens and components, but not in the CSV reader', async () => {
    const usesFetch = "export const get = () => fetch('/api/works');\n";
    expect(await brokenRules('components/screens/works/example.ts', usesFetch)).toContain(
      'no-restricted-globals',
    );
    expect(
      await brokenRules(
        'components/ui/example.ts',
        "import { apiRequest } from '@/hooks/api-client';\nexport const a = apiRequest;\n",
      ),
    ).toContain('no-restricted-imports');
    expect(
      await brokenRules('components/screens/work-import/read-csv-file.ts', usesFetch),
    ).not.toContain('no-restricted-globals');
  });

  it('refuses server code, the database and HTTP in the PDF renderers', async () => {
    for (const code of [
      "import { scoped } from '@/server/access/scoped';\nexport const s = scoped;\n",
      "import { scoped } from '../server/access/scoped';\nexport const s = scoped;\n",
      "import { sql } from 'kysely';\nexport const q = sql`1`;\n",
    ]) {
      expect(await brokenRules('documents/example.ts', code)).toContain('no-restricted-imports');
    }
    expect(
      await brokenRules('documents/layout/example.ts', "export const get = () => fetch('/x');\n"),
    ).toContain('no-restricted-globals');
    expect(
      await brokenRules(
        'documents/example.ts',
        "import { formatMoney } from '@/shared/money/format';\nexport const f = formatMoney;\n",
      ),
    ).toEqual([]);
  });

  it('refuses anything but routes under app/', async () => {
    expect(await brokenRules('app/(studio)/helpers.ts', 'export const x = 1;\n')).toContain(
      'no-restricted-syntax',
    );
    expect(
      await brokenRules(
        'app/(studio)/example.tsx',
        'export default function Example() {\n  return null;\n}\n',
      ),
    ).toEqual([]);
  });
});
