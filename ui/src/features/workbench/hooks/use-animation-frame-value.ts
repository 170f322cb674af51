import { useEffect, useRef, useState } from 'react';

const raf: (cb: () => void) => number =
  typeof requestAnimationFrame === 'function' ? (cb) => requestAnimationFrame(cb) : (cb) => setTimeout(cb, 16) as unknown as number;
const caf: (id: number) => void = typeof cancelAnimationFrame === 'function' ? (id) => cancelAnimationFrame(id) : (id) => clearTimeout(id);

/**
 * The value, updated at most once per animation frame: fast inputs (a slider dragged) change
 * the returned value once a frame with the latest input, so heavy work keyed on it runs at
 * screen rate, not event rate.
 */
export function useAnimationFrameValue<T>(value: T): T {
  const [shown, setShown] = useState(value);
  const latest = useRef(value);
  latest.current = value;
  const frame = useRef<number | null>(null);
  useEffect(() => {
    if (frame.current !== null) return;
    frame.current = raf(() => {
      frame.current = null;
      setShown(latest.current);
    });
  }, [value]);
  useEffect(
    () => () => {
      if (frame.current !== null) caf(frame.current);
    },
    [],
  );
  return shown;
}
