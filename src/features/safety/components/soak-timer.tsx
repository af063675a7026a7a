import { useEffect, useState } from 'react';

const pad = (n: number) => String(n).padStart(2, '0');

/** Time since `startedAt` (the server's clock), ticking each second; a reload picks up where it was. */
export function SoakTimer({ startedAt }: { startedAt: string }) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const tick = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(tick);
  }, []);
  const seconds = Math.max(0, Math.floor((now - Date.parse(startedAt)) / 1000));
  const text = `${Math.floor(seconds / 3600)}:${pad(Math.floor(seconds / 60) % 60)}:${pad(seconds % 60)}`;
  return (
    <span
      className="font-mono text-2xl font-bold"
      role="timer"
      data-testid="soak-timer"
      aria-label={`Running for ${text}`}
    >
      {text}
    </span>
  );
}
