/**
 * A sinusoidal phase in [−1, 1] driven by requestAnimationFrame while `playing`; holds its last
 * value when paused. Used to move joints along a mechanism mode.
 */
import { useEffect, useRef, useState } from 'react';

export function useOscillation(playing: boolean, periodMs = 2600, initial = 0): number {
  const [phase, setPhase] = useState(initial);
  const angle = useRef(Math.asin(Math.max(-1, Math.min(1, initial))));
  useEffect(() => {
    if (!playing || typeof requestAnimationFrame !== 'function') return;
    let frame = 0;
    let last: number | undefined;
    const tick = (t: number) => {
      if (last !== undefined) angle.current += (2 * Math.PI * (t - last)) / periodMs;
      last = t;
      setPhase(Math.sin(angle.current));
      frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [playing, periodMs]);
  return phase;
}
