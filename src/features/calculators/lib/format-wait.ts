/** Seconds as whole minutes where they divide evenly (120 → "2 minutes"), else seconds. */
export function formatWait(seconds: number): string {
  if (seconds % 60 !== 0) return `${seconds} s`;
  const minutes = seconds / 60;
  return minutes === 1 ? '1 minute' : `${minutes} minutes`;
}
