import { Pencil, Trash2 } from 'lucide-react';
import { findDefectKind } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { cn } from '#src/lib/cn.ts';
import { SEVERITY_WORDS } from './defect-picker.tsx';
import { DefectKindTag } from './group-shape.tsx';
import type { NumberedMark } from '../lib/photo-labels.ts';

type MarkListProps = {
  marks: readonly NumberedMark[];
  selectedId: string | null;
  onSelect: (markId: string) => void;
  /** A row under the pointer or keyboard focus lights its mark up on the photo. */
  onHighlight: (markId: string | null) => void;
  canChange: (mark: NumberedMark) => boolean;
  canDelete: (mark: NumberedMark) => boolean;
  onEdit: (mark: NumberedMark) => void;
  onDelete: (mark: NumberedMark) => void;
  currentUserId: string;
};

/** The photo's marks in number order; choosing a row selects its mark on the photo. */
export function MarkList({ marks, selectedId, onSelect, onHighlight, canChange, canDelete, onEdit, onDelete, currentUserId }: MarkListProps) {
  if (!marks.length) {
    return (
      <p className="rounded-md border border-dashed border-line-strong p-3 text-body text-ink-muted">
        No marks yet. Choose <strong className="text-ink">Mark a defect</strong>, then tap the defect on the photo, or drag a box around
        it.
      </p>
    );
  }
  return (
    <ol className="flex flex-col gap-2" aria-label="Marks on this photo">
      {marks.map((mark) => {
        const kind = findDefectKind(mark.kind);
        const selected = mark.id === selectedId;
        return (
          <li
            key={mark.id}
            className={cn(
              'rounded-md border p-2',
              selected ? 'border-ink bg-surface-sunken shadow-[inset_4px_0_0_var(--ps-ink)]' : 'border-line bg-surface-raised',
            )}
            onPointerEnter={() => onHighlight(mark.id)}
            onPointerLeave={() => onHighlight(null)}
          >
            <button
              type="button"
              aria-current={selected || undefined}
              onClick={() => onSelect(mark.id)}
              onFocus={() => onHighlight(mark.id)}
              onBlur={() => onHighlight(null)}
              className="flex min-h-12 w-full flex-col items-start gap-1 rounded px-1 text-left lg:min-h-10"
            >
              <span className="flex w-full items-center gap-2">
                <span className="sr-only">Mark {mark.number}: </span>
                <DefectKindTag kind={mark.kind} number={mark.number} />
                <span className="ml-auto shrink-0 text-caption text-ink-muted">
                  severity <span className="figures text-ink">{mark.severity}</span> · {SEVERITY_WORDS[mark.severity]}
                </span>
              </span>
              <span className="text-caption text-ink-muted">
                {kind?.name ?? mark.kind} · {mark.shape === 'box' ? 'area' : 'spot'} · marked by{' '}
                {mark.authorId === currentUserId ? 'you' : (mark.authorName ?? 'a former member')}
              </span>
              {mark.note ? <span className="text-body text-ink">{mark.note}</span> : null}
            </button>
            {canChange(mark) || canDelete(mark) ? (
              <div className="mt-1 flex flex-wrap gap-2 pl-1">
                {canChange(mark) ? (
                  <Button size="sm" variant="quiet" icon={<Pencil aria-hidden className="size-4" />} onClick={() => onEdit(mark)}>
                    Change<span className="sr-only"> mark {mark.number}</span>
                  </Button>
                ) : null}
                {canDelete(mark) ? (
                  <Button size="sm" variant="quiet" icon={<Trash2 aria-hidden className="size-4" />} onClick={() => onDelete(mark)}>
                    Delete<span className="sr-only"> mark {mark.number}</span>
                  </Button>
                ) : null}
              </div>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}
