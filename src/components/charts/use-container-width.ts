import { useEffect, useRef, useState } from 'react';

/**
 * The width of the element the returned ref is put on, followed as it changes (ResizeObserver).
 * Before the first measurement, and where there is no layout (jsdom, where ResizeObserver is
 * missing or reports 0), the fallback width is used.
 */
export function useContainerWidth<E extends HTMLElement>(fallbackPx: number) {
  const ref = useRef<E>(null);
  const [width, setWidth] = useState(fallbackPx);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const take = (px: number) => {
      if (px > 0) setWidth(Math.floor(px));
    };
    take(el.getBoundingClientRect().width);
    const observer = new ResizeObserver((entries) => {
      for (const entry of entries) take(entry.contentRect.width);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}
