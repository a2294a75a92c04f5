import type { ReactNode, Ref } from 'react';
import type { Size } from '../lib/mark-geometry.ts';
import { cn } from '#src/lib/cn.ts';

type PhotoCanvasProps = {
  src: string;
  alt: string;
  /** The image's stored size: reserves its box before it loads (no layout shift) and is the marks' viewBox. */
  size: Size;
  boxRef?: Ref<HTMLDivElement>;
  /** A placeholder under the image while it loads (e.g. the thumbnail, already cached). */
  placeholderSrc?: string;
  /** The mark overlay and, while marking, the input layer. */
  children?: ReactNode;
  className?: string;
};

/** The photo in its reserved box, with whatever is drawn over it. */
export function PhotoCanvas({ src, alt, size, boxRef, placeholderSrc, children, className }: PhotoCanvasProps) {
  return (
    <div
      ref={boxRef}
      className={cn('relative w-full select-none', className)}
      style={{ aspectRatio: `${size.width} / ${size.height}` }}
    >
      {placeholderSrc ? (
        <img src={placeholderSrc} alt="" aria-hidden className="absolute inset-0 h-full w-full object-fill blur-[1px]" draggable={false} />
      ) : null}
      <img
        src={src}
        alt={alt}
        width={size.width}
        height={size.height}
        decoding="async"
        draggable={false}
        className="absolute inset-0 h-full w-full object-fill"
      />
      {children}
    </div>
  );
}
