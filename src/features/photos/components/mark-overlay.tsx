import type { CSSProperties } from 'react';
import { findDefectKind } from '#shared/domain/index.ts';
import { DEFECT_GROUP_LOOK, LABEL_SHAPE_PATHS } from '#src/config/defect-groups.ts';
import type { MarkGeometry, Point, Size } from '../lib/mark-geometry.ts';
import type { NumberedMark } from '../lib/photo-labels.ts';

// The marks drawn over a photo. The SVG's viewBox is the photo's own pixel
// box (its display size), so a mark at fraction (x, y) sits at (x·W, y·H)
// and scales with the image at every size and zoom. Outlines and labels keep
// their size on screen: the photo box sets `--k`, the viewBox units per
// screen pixel (see use-label-scale.ts), and every stroke and label is
// multiplied by it. Each outline has a dark halo under its colour, so it
// reads on a bright, fresh-cut face and on a dark, sooty one alike.

const HALO = '#141210';
const LABEL_INK = '#FAF7F2';
const DRAFT = '#FFFFFF';
const CHAR_PX = 7.8; // IBM Plex Mono at 13 px
const LABEL_H = 26;

const px = (n: number) => `calc(var(--k, 1) * ${n}px)`;
const strokeStyle = (width: number, extra: CSSProperties = {}): CSSProperties => ({ strokeWidth: px(width), ...extra });
const placed = (x: number, y: number): CSSProperties => ({ transform: `translate(${x}px, ${y}px) scale(var(--k, 1))` });

export type { NumberedMark };

type MarkOverlayProps = {
  size: Size;
  marks: readonly NumberedMark[];
  selectedId?: string | null;
  /** A mark to emphasise less strongly than the selected one (its list row is hovered or focused). */
  highlightId?: string | null;
  /** The mark being drawn, before it has a kind. */
  draft?: MarkGeometry | null;
  /** The keyboard's marking cross. */
  cursor?: Point | null;
  onSelect?: (markId: string) => void;
};

export function MarkOverlay({ size, marks, selectedId, highlightId, draft, cursor, onSelect }: MarkOverlayProps) {
  const { width: W, height: H } = size;
  return (
    <svg
      aria-hidden
      viewBox={`0 0 ${W} ${H}`}
      preserveAspectRatio="none"
      className="pointer-events-none absolute inset-0 h-full w-full overflow-visible"
      data-testid="mark-overlay"
    >
      {marks.map((mark) => (
        <MarkShape
          key={mark.id}
          mark={mark}
          size={size}
          state={mark.id === selectedId ? 'selected' : mark.id === highlightId ? 'highlighted' : 'plain'}
          onSelect={onSelect}
        />
      ))}
      {draft ? <DraftShape draft={draft} size={size} /> : null}
      {cursor ? (
        <g style={placed(cursor.x * W, cursor.y * H)} data-testid="marking-cursor">
          <path d="M-20 0H-6M6 0H20M0 -20V-6M0 6V20" stroke={HALO} strokeOpacity={0.7} strokeWidth={5} strokeLinecap="round" />
          <path d="M-20 0H-6M6 0H20M0 -20V-6M0 6V20" stroke={DRAFT} strokeWidth={2} strokeLinecap="round" />
          <circle r={3} fill={DRAFT} stroke={HALO} strokeWidth={1.5} />
        </g>
      ) : null}
    </svg>
  );
}

function MarkShape({
  mark,
  size,
  state,
  onSelect,
}: {
  mark: NumberedMark;
  size: Size;
  state: 'plain' | 'highlighted' | 'selected';
  onSelect?: (markId: string) => void;
}) {
  const kind = findDefectKind(mark.kind);
  const group = kind?.group ?? 'dimensional';
  const look = DEFECT_GROUP_LOOK[group];
  const colour = look.overlay;
  const { width: W, height: H } = size;
  const emphasis = state === 'selected' ? 1.5 : state === 'highlighted' ? 1 : 0;
  const select = onSelect ? () => onSelect(mark.id) : undefined;
  const interactive: CSSProperties = onSelect ? { pointerEvents: 'all', cursor: 'pointer' } : {};

  const label = {
    number: mark.number,
    letter: look.code,
    name: kind?.shortName ?? mark.kind,
    shapePath: LABEL_SHAPE_PATHS[look.shape],
    colour,
    selected: state === 'selected',
  };

  if (mark.shape === 'box' && mark.width !== null && mark.height !== null) {
    const x = mark.x * W;
    const y = mark.y * H;
    const w = mark.width * W;
    const h = mark.height * H;
    const labelW = labelWidth(label.name);
    // Above the box, unless the box touches the top; flipped left near the right edge.
    const below = mark.y < 0.08;
    const alignRight = mark.x + mark.width > 0.8;
    const ax = alignRight ? x + w : x;
    const ay = below ? y + h : y;
    return (
      <g data-mark-id={mark.id} data-selected={state === 'selected' || undefined} onClick={select} style={interactive}>
        {emphasis > 0 ? (
          <rect x={x} y={y} width={w} height={h} fill="none" stroke={DRAFT} strokeOpacity={0.9} style={strokeStyle(7 + emphasis * 2)} />
        ) : null}
        <rect x={x} y={y} width={w} height={h} fill="transparent" stroke={HALO} strokeOpacity={0.75} style={strokeStyle(5 + emphasis)} />
        <rect x={x} y={y} width={w} height={h} fill="none" stroke={colour} style={strokeStyle(2.5 + emphasis)} />
        <g style={placed(ax, ay)}>
          <MarkLabel {...label} x={alignRight ? -labelW : 0} y={below ? 4 : -LABEL_H - 4} />
        </g>
      </g>
    );
  }

  const alignLeft = mark.x > 0.78;
  const labelW = labelWidth(label.name);
  return (
    <g data-mark-id={mark.id} data-selected={state === 'selected' || undefined} onClick={select} style={interactive}>
      <g style={placed(mark.x * W, mark.y * H)}>
        {emphasis > 0 ? <circle r={14} fill="none" stroke={DRAFT} strokeOpacity={0.9} strokeWidth={7 + emphasis * 2} /> : null}
        <circle r={14} fill="transparent" stroke={HALO} strokeOpacity={0.75} strokeWidth={5 + emphasis} />
        <circle r={14} fill="none" stroke={colour} strokeWidth={2.5 + emphasis} />
        <circle r={2.5} fill={colour} stroke={HALO} strokeWidth={1.5} />
        <MarkLabel {...label} x={alignLeft ? -labelW - 20 : 20} y={-LABEL_H / 2} />
      </g>
    </g>
  );
}

function labelWidth(name: string) {
  // padding, shape, gap, letter, gap, name, padding
  return 4 + 22 + 5 + CHAR_PX + 6 + name.length * CHAR_PX + 10;
}

/** The numbered label: group shape with the number, the group letter, the short name; on a dark plate with a coloured rim. */
function MarkLabel({
  x,
  y,
  number,
  letter,
  name,
  shapePath,
  colour,
  selected,
}: {
  x: number;
  y: number;
  number: number;
  letter: string;
  name: string;
  shapePath: string;
  colour: string;
  selected: boolean;
}) {
  const w = labelWidth(name);
  return (
    <g transform={`translate(${x} ${y})`} style={{ fontFamily: '"IBM Plex Mono", ui-monospace, monospace' }}>
      <rect width={w} height={LABEL_H} rx={4} fill={HALO} fillOpacity={0.95} stroke={selected ? DRAFT : colour} strokeWidth={selected ? 2 : 1.5} />
      <g transform="translate(4 2) scale(0.9)">
        <path d={shapePath} fill={HALO} stroke={colour} strokeWidth={2.4} strokeLinejoin="round" />
        <text x={12} y={13} textAnchor="middle" dominantBaseline="middle" fill={LABEL_INK} style={{ fontSize: number > 9 ? 9 : 11, fontWeight: 700 }}>
          {number}
        </text>
      </g>
      <text x={4 + 22 + 5} y={LABEL_H / 2 + 1} dominantBaseline="middle" fill={colour} style={{ fontSize: 13, fontWeight: 700 }}>
        {letter}
      </text>
      <text x={4 + 22 + 5 + CHAR_PX + 6} y={LABEL_H / 2 + 1} dominantBaseline="middle" fill={LABEL_INK} style={{ fontSize: 13, fontWeight: 500 }}>
        {name}
      </text>
    </g>
  );
}

function DraftShape({ draft, size }: { draft: MarkGeometry; size: Size }) {
  const { width: W, height: H } = size;
  if (draft.shape === 'box') {
    const box = { x: draft.x * W, y: draft.y * H, width: draft.width * W, height: draft.height * H };
    return (
      <g data-testid="mark-draft">
        <rect {...box} fill="none" stroke={HALO} strokeOpacity={0.8} style={strokeStyle(5)} />
        <rect {...box} fill="none" stroke={DRAFT} style={strokeStyle(2.5, { strokeDasharray: `${px(8)} ${px(5)}` })} />
      </g>
    );
  }
  return (
    <g data-testid="mark-draft" style={placed(draft.x * W, draft.y * H)}>
      <circle r={14} fill="none" stroke={HALO} strokeOpacity={0.8} strokeWidth={5} />
      <circle r={14} fill="none" stroke={DRAFT} strokeWidth={2.5} strokeDasharray="6 4" />
      <circle r={2.5} fill={DRAFT} stroke={HALO} strokeWidth={1.5} />
    </g>
  );
}
