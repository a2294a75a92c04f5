import { cn } from '#src/lib/cn.ts';

/** A placeholder block in the shape of what is loading. Skeletons, never spinners. */
export function Skeleton({ className }: { className?: string }) {
  return <div aria-hidden className={cn('rounded bg-surface-sunken motion-safe:animate-pulse', className)} />;
}

/** A labelled loading region: screen readers hear `label`, everyone else sees the shapes. */
export function SkeletonGroup({ label, lines = 3, className }: { label: string; lines?: number; className?: string }) {
  return (
    <div role="status" className={cn('flex flex-col gap-3', className)}>
      <span className="sr-only">{label}</span>
      {Array.from({ length: lines }, (_, i) => (
        <Skeleton key={i} className={cn('h-5', i === lines - 1 ? 'w-2/3' : 'w-full')} />
      ))}
    </div>
  );
}

/** The shape of a page while its code or data loads. */
export function PageSkeleton({ label = 'Loading the page' }: { label?: string }) {
  return (
    <div role="status" className="flex flex-col gap-6">
      <span className="sr-only">{label}</span>
      <Skeleton className="h-9 w-64 max-w-full" />
      <Skeleton className="h-5 w-96 max-w-full" />
      <Skeleton className="h-48 w-full" />
    </div>
  );
}
