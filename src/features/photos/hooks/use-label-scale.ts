import { useCallback, useRef } from 'react';

/**
 * Keeps `--k` on the photo box: viewBox units per screen pixel, so mark
 * outlines and labels stay the same size on screen while the photo is laid
 * out larger or smaller and zoomed in or out. Written straight to the
 * element's style (no re-render on every frame of a pinch).
 */
export function useLabelScale(viewBoxWidth: number) {
  const box = useRef<HTMLDivElement | null>(null);
  const zoom = useRef(1);

  const apply = useCallback(() => {
    const el = box.current;
    if (!el) return;
    const laidOut = el.offsetWidth;
    const k = laidOut > 0 ? viewBoxWidth / (laidOut * zoom.current) : 1;
    el.style.setProperty('--k', String(Number.isFinite(k) && k > 0 ? k : 1));
  }, [viewBoxWidth]);

  /** Ref callback for the photo box; watches its size for as long as it is mounted. */
  const boxRef = useCallback(
    (el: HTMLDivElement | null) => {
      box.current = el;
      if (!el) return;
      apply();
      if (typeof ResizeObserver === 'undefined') return;
      const observer = new ResizeObserver(apply);
      observer.observe(el);
      return () => observer.disconnect();
    },
    [apply],
  );

  const setZoom = useCallback(
    (scale: number) => {
      zoom.current = scale > 0 ? scale : 1;
      apply();
    },
    [apply],
  );

  return { boxRef, box, setZoom };
}
