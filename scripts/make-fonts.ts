// Converts the Nunito weights the app uses from the package's .ttf files to .woff2 (Google's woff2
// compressor, built to WebAssembly by wawoff2): about 40 % of the bytes, and woff2 is already compressed,
// so it goes out as it is. Run after changing the weights: `npm run fonts`. The .woff2 files are
// committed (like the icons), so a build never needs this step. Skia's chart keeps the .ttf: CanvasKit
// reads TrueType.
import { readFileSync, writeFileSync } from 'node:fs';
import { brotliCompressSync } from 'node:zlib';
import * as wawoff2 from 'wawoff2';

const weights = ['400Regular', '700Bold', '800ExtraBold'];

void (async () => {
  for (const w of weights) {
    const ttf = readFileSync(`node_modules/@expo-google-fonts/nunito/${w}/Nunito_${w}.ttf`);
    const woff2 = Buffer.from(await wawoff2.compress(ttf));
    writeFileSync(`assets/fonts/Nunito_${w}.woff2`, woff2);
    console.log(`Nunito_${w}: ttf ${ttf.length} bytes (brotli ${brotliCompressSync(ttf).length}), woff2 ${woff2.length} bytes`);
  }
})();
