// Renders the Keyoff mark (assets/brand/icon.svg) to the PNGs Expo uses. Run after editing the SVG:
// `npm run icons`. The PNGs are committed so a build never needs this step.
import { readFileSync, writeFileSync } from 'node:fs';
import { Resvg } from '@resvg/resvg-js';

const svg = readFileSync('assets/brand/icon.svg', 'utf8');
const outputs: [string, number][] = [
  ['assets/images/icon.png', 1024],
  ['assets/images/favicon.png', 48],
  ['assets/images/mark.png', 256],
];
for (const [file, size] of outputs) {
  const png = new Resvg(svg, { fitTo: { mode: 'width', value: size } }).render().asPng();
  writeFileSync(file, png);
  console.log(`${file}: ${size}x${size}, ${png.length} bytes`);
}
