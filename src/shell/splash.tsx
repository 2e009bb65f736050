import { useEffect } from 'react';
import { RingMark } from '../components/ui/icons';

export function Splash() {
  return (
    <div role="status" className="flex min-h-dvh items-center justify-center gap-3 text-lg">
      <RingMark />
      <span>Loading Ringseat…</span>
    </div>
  );
}

/** Loads the current address again as a whole page: it belongs to the other app (src/main.tsx). */
export function ReloadPage() {
  useEffect(() => window.location.reload(), []);
  return <Splash />;
}
