/**
 * The voltage-drop test's verdict: the measured drop against the drop the run is allowed (ABYC E-11:
 * 3 % for critical circuits, 10 % for others; the run's own limit where it names one).
 */
export type DropVerdict = { allowedPercent: number; within: boolean; message: string };

export function dropVerdict(dropPercent: number, allowedPercent: number): DropVerdict {
  const within = dropPercent <= allowedPercent + 1e-9;
  const over = Math.round((dropPercent - allowedPercent) * 100) / 100;
  return {
    allowedPercent,
    within,
    message: within
      ? `${dropPercent} % lost, within the ${allowedPercent} % this run is allowed.`
      : `${dropPercent} % lost on a run allowed ${allowedPercent} %: ${over} points over. The device sees too little voltage; look for a poor joint or ground first, then a larger cable.`,
  };
}
