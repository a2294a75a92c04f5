import { cn } from '#src/lib/cn.ts';

/**
 * A thumbnail in a box reserved from its stored size, so the grid does not
 * move as images arrive; loaded lazily, as it nears the screen.
 */
export function PhotoThumb({ src, size, alt = '', className }: { src: string; size: { width: number; height: number }; alt?: string; className?: string }) {
  return (
    <div className={cn('relative w-full overflow-hidden rounded-md bg-surface-sunken', className)} style={{ aspectRatio: `${size.width} / ${size.height}` }}>
      <img src={src} alt={alt} width={size.width} height={size.height} loading="lazy" decoding="async" className="absolute inset-0 h-full w-full object-cover" />
    </div>
  );
}
