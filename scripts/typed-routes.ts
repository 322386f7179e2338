/**
 * Writes Expo Router's typed-route declarations (.expo/types/router.d.ts and expo-env.d.ts) the way
 * `expo start` does, without starting a dev server, so that `tsc` checks every href.
 */
import fs from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

import { requireContext } from 'expo-router/internal/testing';

const projectRoot = path.resolve(__dirname, '..');
const appRoot = path.join(projectRoot, 'app');
const typesDirectory = path.join(projectRoot, '.expo', 'types');

// Expo Router reads its app root from here; Metro compiles it away, plain Node needs it set.
process.env.EXPO_ROUTER_APP_ROOT = appRoot;

// The generator ships with @expo/cli, which may sit nested under expo's own node_modules.
const load = createRequire(__filename);
const cliRoot = path.dirname(
  load.resolve('@expo/cli/package.json', { paths: [load.resolve('expo/package.json')] }),
);
const generatorPath = load.resolve('@expo/router-server/build/typed-routes/generate', {
  paths: [cliRoot],
});

const { getTypedRoutesDeclarationFile } = load(generatorPath) as {
  getTypedRoutesDeclarationFile: (ctx: ReturnType<typeof requireContext>) => string;
};

// The files Expo Router itself treats as routes (it skips +html and +api files).
const { EXPO_ROUTER_CTX_IGNORE } = load('expo-router/_ctx-shared') as {
  EXPO_ROUTER_CTX_IGNORE: RegExp;
};

const declarations = getTypedRoutesDeclarationFile(
  requireContext(appRoot, true, EXPO_ROUTER_CTX_IGNORE),
);
if (!declarations) throw new Error(`No routes found under ${appRoot}`);

fs.mkdirSync(typesDirectory, { recursive: true });
fs.writeFileSync(path.join(typesDirectory, 'router.d.ts'), declarations);
fs.writeFileSync(
  path.join(projectRoot, 'expo-env.d.ts'),
  '/// <reference types="expo/types" />\n\n// NOTE: This file should not be edited and should be in your git ignore',
);
console.log(`Typed routes written to ${path.relative(projectRoot, typesDirectory)}/router.d.ts`);
