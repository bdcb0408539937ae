// subset-font ships no types; scripts/make-fonts.ts uses only this.
declare module 'subset-font' {
  export default function subsetFont(font: Buffer, text: string, options?: { targetFormat?: 'sfnt' | 'woff' | 'woff2' }): Promise<Buffer>;
}
