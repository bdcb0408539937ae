// wawoff2 ships no types; scripts/make-fonts.ts uses only this.
declare module 'wawoff2' {
  export function compress(ttf: Uint8Array): Promise<Uint8Array>;
}
