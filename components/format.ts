import type { MarginState } from '@/shared/energy/project';
import { colors } from '@/shared/theme';

/** "2.4 days", "under an hour", or "more than 14 days" when the cut-off is beyond the horizon. */
export function formatDays(days: number | null, horizonDays: number): string {
  if (days === null) return `more than ${horizonDays} days`;
  if (days < 1 / 24) return 'under an hour';
  if (days < 1) return `${Math.round(days * 24)} hours`;
  return `${days < 10 ? days.toFixed(1) : Math.round(days)} days`;
}

export const MARGIN_LABEL: Record<MarginState, string> = { comfortable: 'Comfortable', tight: 'Tight', short: 'Short' };
export const MARGIN_COLOR: Record<MarginState, string> = { comfortable: colors.comfortable, tight: colors.tight, short: colors.short };

export function formatWhen(iso: string, now = Date.now()): string {
  const minutes = Math.round((now - new Date(iso).getTime()) / 60_000);
  if (minutes < 1) return 'just now';
  if (minutes < 60) return `${minutes} min ago`;
  const hours = Math.round(minutes / 60);
  if (hours < 24) return `${hours} h ago`;
  return new Date(iso).toLocaleDateString();
}
