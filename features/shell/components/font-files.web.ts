/* eslint-disable @typescript-eslint/no-require-imports -- Metro bundles an asset through require(); Expo's lint list of asset types lacks woff2 */
import { fonts } from '@/shared/theme';

// The same weights as woff2 (`npm run fonts` makes them from the package's .ttf): a third fewer bytes than
// the .ttf even after brotli.
export const fontFiles = {
  [fonts.regular]: require('@/assets/fonts/Nunito_400Regular.woff2'),
  [fonts.bold]: require('@/assets/fonts/Nunito_700Bold.woff2'),
  [fonts.heavy]: require('@/assets/fonts/Nunito_800ExtraBold.woff2'),
};
