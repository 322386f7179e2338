// Stands in for zod's `locales/index.js` in the web bundle: English only, zod's default and the
// only language the app's messages use. See metro.config.js.
export { default as en } from 'zod/v4/locales/en.js';
