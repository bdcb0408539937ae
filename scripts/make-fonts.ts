// Makes the web app's fonts (assets/fonts/*.woff2) from the Nunito weights the app uses: subset to the
// Latin letters, punctuation and symbols Keyoff writes (HarfBuzz's hb-subset, built to WebAssembly, by
// subset-font), then woff2. A character outside the subset (a name in another script) falls back to the
// system font, glyph by glyph. Run after changing the weights or the subset: `npm run fonts`. The .woff2
// files are committed (like the icons), so a build never needs this step. Devices and Skia's chart keep the
// package's full .ttf (CanvasKit reads TrueType).
import { readFileSync, writeFileSync } from 'node:fs';
import { brotliCompressSync } from 'node:zlib';
import subsetFont from 'subset-font';

const weights = ['400Regular', '700Bold', '800ExtraBold'];

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => String.fromCodePoint(from + i)).join('');
const TEXT =
  range(0x20, 0x7e) + // Basic Latin
  range(0xa0, 0xff) + // Latin-1 Supplement (°, ±, µ, ×, accented letters)
  range(0x100, 0x17f) + // Latin Extended-A (names)
  range(0x2010, 0x2027) + // dashes, quotes, bullet, ellipsis
  '′″€£−→←↑↓≈≤≥▲▼●○✓✗';

void (async () => {
  for (const w of weights) {
    const ttf = readFileSync(`node_modules/@expo-google-fonts/nunito/${w}/Nunito_${w}.ttf`);
    const woff2 = await subsetFont(ttf, TEXT, { targetFormat: 'woff2' });
    writeFileSync(`assets/fonts/Nunito_${w}.woff2`, woff2);
    console.log(`Nunito_${w}: ttf ${ttf.length} bytes (brotli ${brotliCompressSync(ttf).length}), subset woff2 ${woff2.length} bytes`);
  }
})();
