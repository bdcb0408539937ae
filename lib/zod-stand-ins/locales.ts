// Stands in for zod's `locales` module in the app's bundle (metro.config.js): zod re-exports every locale
// it has from core and classic, some 40 KB compressed on the first screen, and the app uses English only
// (zod's default, with our messages from shared/schemas/error-map.ts over it). `z.locales.en` still works;
// any other locale is not there.
export { default as en } from 'zod/v4/locales/en.js';
