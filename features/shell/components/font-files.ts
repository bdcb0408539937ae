import { fonts } from '@/shared/theme';

// Only the weights the theme uses ship with the app, straight from the package's .ttf files (a device reads TrueType).
export const fontFiles = {
  [fonts.regular]: require('@expo-google-fonts/nunito/400Regular/Nunito_400Regular.ttf'),
  [fonts.bold]: require('@expo-google-fonts/nunito/700Bold/Nunito_700Bold.ttf'),
  [fonts.heavy]: require('@expo-google-fonts/nunito/800ExtraBold/Nunito_800ExtraBold.ttf'),
};
