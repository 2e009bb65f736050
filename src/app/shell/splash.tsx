import { RingMark } from '../../components/ui/icons';

export function Splash() {
  return (
    <div role="status" className="flex min-h-dvh items-center justify-center gap-3 text-lg">
      <RingMark />
      <span>Loading Ringseat…</span>
    </div>
  );
}
