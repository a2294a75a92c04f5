import { findDefectKind } from '#shared/domain/index.ts';
import type { Photo } from '#shared/photos/photo-schemas.ts';
import { DEFECT_GROUP_LOOK } from '#src/config/defect-groups.ts';
import type { ReportMark } from '../lib/numbered-marks.ts';

const HALO = '#141210';
const HIGHLIGHT = '#FFFFFF';

type ReportPhotoProps = {
  photo: Photo;
  marks: readonly ReportMark[];
  /** The mark a comment points at: drawn thicker, with a white ring, and named under the photo. */
  highlightMarkId?: string | null;
  caption?: string;
};

/**
 * A report's photo with its numbered marks. The box is reserved from the
 * stored size, so nothing shifts as the image arrives.
 */
export function ReportPhoto({ photo, marks, highlightMarkId, caption }: ReportPhotoProps) {
  const { width: W, height: H } = photo.display;
  const highlighted = marks.find((m) => m.id === highlightMarkId);
  return (
    <figure className="flex flex-col gap-1" data-testid={`report-photo-${photo.id}`}>
      <div className="relative w-full overflow-hidden rounded-md bg-surface-sunken" style={{ aspectRatio: `${W} / ${H}` }}>
        <img src={photo.urls.display} alt={caption ?? photo.title ?? 'Casting photo'} width={W} height={H} className="absolute inset-0 h-full w-full object-contain" />
        <svg aria-hidden viewBox={`0 0 ${W} ${H}`} preserveAspectRatio="none" className="pointer-events-none absolute inset-0 h-full w-full">
          {marks.map((m) => {
            const look = DEFECT_GROUP_LOOK[findDefectKind(m.kind)?.group ?? 'dimensional'];
            const on = m.id === highlightMarkId;
            const sw = (on ? 5 : 2.5) * (W / 800);
            const text = `${m.number} ${look.code}`;
            const fontSize = 16 * (W / 800);
            if (m.shape === 'box' && m.width !== null && m.height !== null) {
              const [x, y, w, h] = [m.x * W, m.y * H, m.width * W, m.height * H];
              return (
                <g key={m.id} data-mark-id={m.id} data-highlighted={on || undefined}>
                  {on ? <rect x={x} y={y} width={w} height={h} fill="none" stroke={HIGHLIGHT} strokeWidth={sw * 2.6} /> : null}
                  <rect x={x} y={y} width={w} height={h} fill="none" stroke={HALO} strokeWidth={sw * 1.8} />
                  <rect x={x} y={y} width={w} height={h} fill="none" stroke={look.overlay} strokeWidth={sw} />
                  <text x={x + 4} y={Math.max(fontSize, y - 4)} fontSize={fontSize} fill={HIGHLIGHT} stroke={HALO} strokeWidth={fontSize / 5} paintOrder="stroke" fontWeight={700}>
                    {text}
                  </text>
                </g>
              );
            }
            const [cx, cy, r] = [m.x * W, m.y * H, 14 * (W / 800)];
            return (
              <g key={m.id} data-mark-id={m.id} data-highlighted={on || undefined}>
                {on ? <circle cx={cx} cy={cy} r={r * 1.6} fill="none" stroke={HIGHLIGHT} strokeWidth={sw * 1.4} /> : null}
                <circle cx={cx} cy={cy} r={r} fill="none" stroke={HALO} strokeWidth={sw * 1.8} />
                <circle cx={cx} cy={cy} r={r} fill="none" stroke={look.overlay} strokeWidth={sw} />
                <text x={cx + r * 1.5} y={cy + fontSize / 3} fontSize={fontSize} fill={HIGHLIGHT} stroke={HALO} strokeWidth={fontSize / 5} paintOrder="stroke" fontWeight={700}>
                  {text}
                </text>
              </g>
            );
          })}
        </svg>
      </div>
      <figcaption className="text-caption text-ink-muted">
        {caption ? <span>{caption}. </span> : null}
        {marks.length === 0 ? 'No marks yet.' : marks.map((m) => m.label).join('; ')}
        {highlighted ? (
          <span role="status" className="block font-semibold text-ink">
            Showing {highlighted.label}
          </span>
        ) : null}
      </figcaption>
    </figure>
  );
}
