/**
 * The visible depth window of the depth view and the zoom / pan steps on it. Pure functions:
 * the component keeps the window in state and applies these on wheel, drag and keys.
 */

export interface DepthWindow {
  top: number;
  base: number;
}

/** Smallest window, in depth units, the view zooms into. */
export const MIN_WINDOW_SPAN = 2;

/** Keeps a window inside [limits.top, limits.base] and at least MIN_WINDOW_SPAN tall (or the whole range). */
export function clampWindow(w: DepthWindow, limits: DepthWindow): DepthWindow {
  const full = limits.base - limits.top;
  let span = Math.min(Math.max(w.base - w.top, Math.min(MIN_WINDOW_SPAN, full)), full);
  if (!(span > 0)) span = full;
  let top = w.top;
  if (top < limits.top) top = limits.top;
  if (top + span > limits.base) top = limits.base - span;
  return { top, base: top + span };
}

/**
 * Zooms about a depth: `factor` < 1 zooms in (the window shrinks), > 1 zooms out. The anchor
 * depth stays at the same screen position.
 */
export function zoomWindow(w: DepthWindow, factor: number, anchor: number, limits: DepthWindow): DepthWindow {
  const a = Math.min(Math.max(anchor, w.top), w.base);
  return clampWindow({ top: a - (a - w.top) * factor, base: a + (w.base - a) * factor }, limits);
}

/** Moves the window by `delta` depth units (positive = deeper). */
export function panWindow(w: DepthWindow, delta: number, limits: DepthWindow): DepthWindow {
  return clampWindow({ top: w.top + delta, base: w.base + delta }, limits);
}

/** The window after a key press, or null when the key is not a view key. */
export function windowForKey(key: string, w: DepthWindow, limits: DepthWindow): DepthWindow | null {
  const span = w.base - w.top;
  const mid = (w.top + w.base) / 2;
  switch (key) {
    case 'ArrowDown':
      return panWindow(w, span * 0.1, limits);
    case 'ArrowUp':
      return panWindow(w, -span * 0.1, limits);
    case 'PageDown':
      return panWindow(w, span * 0.9, limits);
    case 'PageUp':
      return panWindow(w, -span * 0.9, limits);
    case '+':
    case '=':
      return zoomWindow(w, 0.8, mid, limits);
    case '-':
    case '_':
      return zoomWindow(w, 1.25, mid, limits);
    case 'Home':
    case '0':
      return { ...limits };
    default:
      return null;
  }
}

/**
 * Index range [start, end) of the samples whose depth lies in the window (depth increasing),
 * widened by one sample each side so lines run to the frame.
 */
export function visibleRange(depth: ArrayLike<number>, w: DepthWindow): [number, number] {
  const n = depth.length;
  const lower = (x: number) => {
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (depth[mid] < x) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  const start = Math.max(0, lower(w.top) - 1);
  const end = Math.min(n, lower(w.base) + 1 + 1);
  return [start, Math.max(start, end)];
}

/** The sample index nearest to `d` (depth increasing), or -1 when there are no samples. */
export function nearestIndex(depth: ArrayLike<number>, d: number): number {
  const n = depth.length;
  if (!n) return -1;
  let lo = 0;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (depth[mid] < d) lo = mid + 1;
    else hi = mid;
  }
  if (lo > 0 && Math.abs(depth[lo - 1] - d) <= Math.abs(depth[lo] - d)) return lo - 1;
  return lo;
}
