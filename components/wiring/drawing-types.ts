import type { HookupPart } from '@/shared/energy/hookup/plan';

export type CircuitDrawingProps = {
  size: string;
  lengthM: number;
  dropPercent: number;
  allowedDropPercent?: number;
  fuseA: number;
  device: string;
  returnPath: 'cable' | 'chassis';
  testID?: string;
};

/** The drawn circuit's height: the space is kept while the drawings load. */
export const CIRCUIT_DRAWING_HEIGHT = 150;

/** One part of the hook-up drawing on its rails; it fills the row it sits in. */
export type HookupSymbolProps = { part: HookupPart; chassis: boolean };

/** The width of the hook-up drawing's column, beside the parts' labels. */
export const HOOKUP_SYMBOL_WIDTH = 92;
