import drawings, { type Drawings } from './drawings-impl';

/** On a device the drawings are part of the app. */
export function useDrawings(): Drawings | null {
  return drawings;
}
