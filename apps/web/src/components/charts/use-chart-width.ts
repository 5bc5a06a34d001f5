import { useLayoutEffect, useRef, useState } from "react";

/**
 * Width of the chart's container, tracked with ResizeObserver so charts fill their card.
 * Falls back to `fallback` where there is no layout (tests in jsdom) or before first measure.
 */
export function useChartWidth<T extends HTMLElement>(fallback = 720) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === "undefined") return;
    const measured = el.getBoundingClientRect().width;
    if (measured > 0) setWidth(Math.floor(measured));
    const ro = new ResizeObserver((entries) => {
      const w = entries[0]?.contentRect.width;
      if (w && w > 0) setWidth(Math.floor(w));
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  return [ref, width] as const;
}
