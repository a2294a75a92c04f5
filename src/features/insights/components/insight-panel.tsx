import { useState, type ReactNode } from 'react';
import { Card } from '#src/components/ui/card.tsx';
import { ErrorPanel } from '#src/components/ui/error-boundary.tsx';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';

export type PanelState = { status: 'pending' } | { status: 'error'; error: unknown; retry: () => void } | { status: 'empty' } | { status: 'ready' };

type InsightPanelProps = {
  title: string;
  description?: ReactNode;
  state: PanelState;
  /** What to log to fill this chart, shown when there is nothing to draw. */
  empty: ReactNode;
  /** The picture: hidden from screen readers, who get the table. */
  chart: () => ReactNode;
  /** The same figures as a table, always in the page (visually hidden while the chart shows). */
  table: () => ReactNode;
  /** Controls that change what the panel shows (a kind picker). */
  controls?: ReactNode;
  footnote?: ReactNode;
};

/**
 * One insight: a chart with a table view of the same numbers. The table is
 * always rendered, so screen readers and keyboards reach every figure and
 * every link the chart's bars and points open; the toggle only decides
 * which one sighted readers see.
 */
export function InsightPanel({ title, description, state, empty, chart, table, controls, footnote }: InsightPanelProps) {
  const [view, setView] = useState<'chart' | 'table'>('chart');
  return (
    <Card
      aria-label={title}
      className="flex min-w-0 flex-col gap-3"
      title={title}
      description={description}
      actions={
        state.status === 'ready' ? (
          <SegmentedControl
            legend={`Show ${title.toLowerCase()} as`}
            hideLegend
            options={[
              { value: 'chart', label: 'Chart' },
              { value: 'table', label: 'Table' },
            ]}
            value={view}
            onChange={setView}
            className="w-44"
          />
        ) : null
      }
    >
      {controls ? <div className="mb-3 flex flex-wrap gap-3">{controls}</div> : null}
      {state.status === 'pending' ? <SkeletonGroup label={`Loading ${title.toLowerCase()}`} lines={5} /> : null}
      {state.status === 'error' ? <ErrorPanel error={state.error} reset={state.retry} title={`${title} did not load`} /> : null}
      {state.status === 'empty' ? <div className="flex max-w-prose flex-col gap-2 rounded-md bg-surface-sunken p-4 text-body text-ink">{empty}</div> : null}
      {state.status === 'ready' ? (
        <>
          {view === 'chart' ? (
            <div aria-hidden className="h-72 w-full">
              {chart()}
            </div>
          ) : null}
          <div className={view === 'chart' ? 'sr-only' : 'overflow-x-auto'}>{table()}</div>
          {footnote ? <div className="text-caption text-ink-muted">{footnote}</div> : null}
        </>
      ) : null}
    </Card>
  );
}

/** Table cell classes: figures right-aligned in tabular numerals. */
export const th = 'border-b border-line-strong px-2 py-1.5 text-left text-caption font-semibold text-ink-muted';
export const td = 'border-b border-line px-2 py-1.5 align-top text-body text-ink';
export const tdFigure = `${td} figures text-right whitespace-nowrap`;
export const thFigure = `${th} text-right`;

/** Colours for series that are not defect groups; each series also gets its own marker shape. */
export const SERIES_COLOURS = [
  'var(--ps-link)',
  'var(--ps-heat)',
  'var(--ps-sound)',
  'var(--ps-caution)',
  'var(--ps-ink-muted)',
  'var(--ps-danger)',
] as const;
export const SERIES_SHAPES = ['circle', 'square', 'triangle', 'diamond', 'cross', 'star', 'wye'] as const;
export const SHAPE_WORDS: Record<(typeof SERIES_SHAPES)[number], string> = {
  circle: 'circles',
  square: 'squares',
  triangle: 'triangles',
  diamond: 'diamonds',
  cross: 'crosses',
  star: 'stars',
  wye: 'Y marks',
};

/** Legend labels in ink: the swatch carries the series colour, the words stay readable on any theme. */
export const legendText = (value: unknown) => <span className="text-ink">{String(value)}</span>;
