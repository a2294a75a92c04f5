import { Minus, Plus, RotateCcw } from 'lucide-react';
import { useRef, useState, type KeyboardEvent, type PointerEvent, type Ref } from 'react';
import { TransformComponent, TransformWrapper, type ReactZoomPanPinchContentRef } from 'react-zoom-pan-pinch';
import type { Photo } from '#shared/photos/photo-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { useLabelScale } from '../hooks/use-label-scale.ts';
import { markFromDrag, nudge, type MarkGeometry, type Point } from '../lib/mark-geometry.ts';
import { MarkOverlay, type NumberedMark } from './mark-overlay.tsx';
import { PhotoCanvas } from './photo-canvas.tsx';

export const MAX_ZOOM = 8;

type PhotoViewerProps = {
  photo: Photo;
  alt: string;
  marks: readonly NumberedMark[];
  selectedId: string | null;
  highlightId: string | null;
  /** While marking, a press on the photo draws instead of panning. */
  marking: boolean;
  draft: MarkGeometry | null;
  /** The keyboard's marking cross (shown while marking). */
  cursor: Point;
  onCursorChange: (p: Point) => void;
  /** A finished tap or drag, or Enter at the cross. */
  onDraft: (geometry: MarkGeometry) => void;
  onSelectMark: (markId: string) => void;
  zoomRef: Ref<ReactZoomPanPinchContentRef>;
  surfaceRef: Ref<HTMLDivElement>;
};

type Gesture = { pointerId: number; start: Point; rect: DOMRect };

/**
 * The photo, large, with zoom and pan (pinch on a phone, wheel or the
 * buttons on a desktop) and its marks drawn over it. In marking mode the
 * pan is switched off and a layer over the photo takes the press: a tap
 * marks a point, a drag a box.
 */
export function PhotoViewer({
  photo,
  alt,
  marks,
  selectedId,
  highlightId,
  marking,
  draft,
  cursor,
  onCursorChange,
  onDraft,
  onSelectMark,
  zoomRef,
  surfaceRef,
}: PhotoViewerProps) {
  const size = photo.display;
  const { boxRef, box, setZoom } = useLabelScale(size.width);
  const gesture = useRef<Gesture | null>(null);
  const [live, setLive] = useState<MarkGeometry | null>(null);
  // Unzoomed, a one-finger drag must scroll the page, not be taken as a pan
  // (the photo fills most of a phone's screen).
  const [zoomed, setZoomed] = useState(false);
  const ratio = size.width / size.height;

  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    if (!event.isPrimary || (event.pointerType === 'mouse' && event.button !== 0) || !box.current) {
      // A second finger: this was a pinch, not a mark.
      gesture.current = null;
      setLive(null);
      return;
    }
    event.preventDefault();
    event.currentTarget.setPointerCapture?.(event.pointerId);
    gesture.current = { pointerId: event.pointerId, start: { x: event.clientX, y: event.clientY }, rect: box.current.getBoundingClientRect() };
  };
  const onPointerMove = (event: PointerEvent<HTMLDivElement>) => {
    const g = gesture.current;
    if (!g || g.pointerId !== event.pointerId) return;
    const geometry = markFromDrag(g.start, { x: event.clientX, y: event.clientY }, g.rect);
    setLive(geometry.shape === 'box' ? geometry : null);
  };
  const onPointerUp = (event: PointerEvent<HTMLDivElement>) => {
    const g = gesture.current;
    gesture.current = null;
    setLive(null);
    if (!g || g.pointerId !== event.pointerId) return;
    const geometry = markFromDrag(g.start, { x: event.clientX, y: event.clientY }, g.rect);
    onCursorChange({ x: geometry.x + (geometry.shape === 'box' ? geometry.width / 2 : 0), y: geometry.y + (geometry.shape === 'box' ? geometry.height / 2 : 0) });
    onDraft(geometry);
  };
  const onPointerCancel = () => {
    gesture.current = null;
    setLive(null);
  };
  const onSurfaceKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const moved = nudge(cursor, event.key, event.shiftKey ? 0.1 : 0.02);
    if (moved) {
      event.preventDefault();
      onCursorChange(moved);
    } else if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      onDraft({ shape: 'point', x: cursor.x, y: cursor.y });
    }
  };

  return (
    <div className="flex flex-col gap-2">
      <TransformWrapper
        ref={zoomRef}
        minScale={1}
        maxScale={MAX_ZOOM}
        limitToBounds
        centerZoomedOut
        wheel={{ step: 0.15 }}
        panning={{ disabled: marking || !zoomed, velocityDisabled: true }}
        pinch={{ disabled: marking }}
        doubleClick={{ disabled: marking, mode: 'toggle', step: 1.2 }}
        onTransform={(_ref, state) => {
          setZoom(state.scale);
          setZoomed(state.scale > 1.01);
        }}
      >
        {(controls) => (
          <>
            <div
              className="relative mx-auto w-full overflow-hidden rounded-md bg-graphite-980"
              style={{ aspectRatio: `${size.width} / ${size.height}`, maxHeight: '75dvh', maxWidth: `calc(75dvh * ${ratio})` }}
            >
              <TransformComponent wrapperStyle={{ width: '100%', height: '100%' }} contentStyle={{ width: '100%', height: '100%' }}>
                <PhotoCanvas src={photo.urls.display} alt={alt} size={size} boxRef={boxRef} placeholderSrc={photo.urls.thumb} className="h-full">
                  <MarkOverlay
                    size={size}
                    marks={marks}
                    selectedId={selectedId}
                    highlightId={highlightId}
                    draft={live ?? draft}
                    cursor={marking && !live && !draft ? cursor : null}
                    onSelect={marking ? undefined : onSelectMark}
                  />
                  {marking ? (
                    <div
                      ref={surfaceRef}
                      role="application"
                      tabIndex={0}
                      aria-roledescription="marking surface"
                      aria-label="Photo. Tap the defect, or drag a box around it. With the keyboard, move the cross with the arrow keys (Shift for bigger steps) and press Enter."
                      className="absolute inset-0 z-10 cursor-crosshair touch-none outline-none focus-visible:outline-2 focus-visible:-outline-offset-4 focus-visible:outline-white"
                      onPointerDown={onPointerDown}
                      onPointerMove={onPointerMove}
                      onPointerUp={onPointerUp}
                      onPointerCancel={onPointerCancel}
                      onKeyDown={onSurfaceKeyDown}
                    />
                  ) : null}
                </PhotoCanvas>
              </TransformComponent>
            </div>
            <div className="flex flex-wrap items-center justify-center gap-2" role="group" aria-label="Zoom">
              <Button size="sm" icon={<Minus aria-hidden className="size-4" />} onClick={() => void controls.zoomOut(0.5)}>
                Zoom out
              </Button>
              <Button size="sm" icon={<Plus aria-hidden className="size-4" />} onClick={() => void controls.zoomIn(0.5)}>
                Zoom in
              </Button>
              <Button size="sm" icon={<RotateCcw aria-hidden className="size-4" />} onClick={() => void controls.resetTransform()}>
                Fit
              </Button>
              <a
                href={photo.urls.original}
                target="_blank"
                rel="noreferrer"
                className="inline-flex min-h-12 items-center px-2 text-caption font-medium text-link underline lg:min-h-9"
              >
                Full-size original<span className="sr-only"> (opens in a new tab)</span>
                <span className="figures ml-1 text-ink-muted">
                  ({photo.original.width} × {photo.original.height} px)
                </span>
              </a>
            </div>
          </>
        )}
      </TransformWrapper>
    </div>
  );
}
