import { useSuspenseQuery } from '@tanstack/react-query';
import { Crosshair, Keyboard, Pencil, Trash2, X } from 'lucide-react';
import { useEffect, useEffectEvent, useMemo, useRef, useState } from 'react';
import type { ReactZoomPanPinchContentRef } from 'react-zoom-pan-pinch';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { can } from '#shared/auth/permissions.ts';
import type { Actor } from '#shared/auth/roles.ts';
import { MOLD_MATERIAL_LABELS, findDefectKind } from '#shared/domain/index.ts';
import type { Mark } from '#shared/photos/photo-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDateTime } from '#src/lib/format.ts';
import { photoQueries } from '../api/photo-queries.ts';
import { useCreateMark } from '../api/use-create-mark.ts';
import { useDeleteMark } from '../api/use-delete-mark.ts';
import { useDeletePhoto } from '../api/use-delete-photo.ts';
import { useUpdateMark } from '../api/use-update-mark.ts';
import { markCentre, type MarkGeometry, type Point } from '../lib/mark-geometry.ts';
import { numberMarks, photoLabel, type NumberedMark } from '../lib/photo-labels.ts';
import { ConfirmDialog } from './confirm-dialog.tsx';
import { DefectPicker, type MarkChoice } from './defect-picker.tsx';
import { MarkList } from './mark-list.tsx';
import { PhotoDetailsForm } from './photo-details-form.tsx';
import { PhotoViewer } from './photo-viewer.tsx';

export const PHOTO_SHORTCUTS: readonly { keys: string[]; what: string }[] = [
  { keys: ['m'], what: 'Mark a defect: shows a cross on the photo (arrow keys move it, Enter marks it)' },
  { keys: ['/'], what: 'Mark at the cross and open the defect search; in the search, jump back to it' },
  { keys: ['[', ']'], what: 'Previous or next mark (also k and j); when zoomed in, the view follows' },
  { keys: ['e'], what: 'Change the selected mark' },
  { keys: ['Delete'], what: 'Delete the selected mark (asks first)' },
  { keys: ['+', '−', '0'], what: 'Zoom in, zoom out, fit the photo' },
  { keys: ['Esc'], what: 'Stop marking, close the search, or clear the selection' },
];

type Picking = { mode: 'create'; geometry: MarkGeometry } | { mode: 'edit'; mark: NumberedMark };

const CENTRE: Point = { x: 0.5, y: 0.5 };

function isTyping(target: EventTarget | null) {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  if (target.tagName === 'TEXTAREA' || target.tagName === 'SELECT') return true;
  return target.tagName === 'INPUT' && !['radio', 'checkbox', 'button', 'submit'].includes((target as HTMLInputElement).type);
}

type PhotoWorkspaceProps = { workshopId: string; photoId: string; actor: Actor };

/**
 * The photo page's working area: the photo leads; beside it on a desktop
 * (under it on a phone) the numbered marks, the photo's details and the
 * keyboard shortcuts.
 */
export function PhotoWorkspace({ workshopId, photoId, actor }: PhotoWorkspaceProps) {
  const { data: photo } = useSuspenseQuery(photoQueries.detail(workshopId, photoId));
  const navigate = useNavigate();
  const marks = useMemo(() => numberMarks(photo.marks), [photo.marks]);

  const [marking, setMarking] = useState(false);
  const [cursor, setCursor] = useState<Point>(CENTRE);
  const [draft, setDraft] = useState<MarkGeometry | null>(null);
  const [picking, setPicking] = useState<Picking | null>(null);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [highlightId, setHighlightId] = useState<string | null>(null);
  const [confirming, setConfirming] = useState<NumberedMark | null>(null);
  const [confirmPhotoDelete, setConfirmPhotoDelete] = useState(false);
  const [editingDetails, setEditingDetails] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  const zoomRef = useRef<ReactZoomPanPinchContentRef | null>(null);
  const surfaceRef = useRef<HTMLDivElement | null>(null);
  const markButtonRef = useRef<HTMLButtonElement | null>(null);

  const createMark = useCreateMark(workshopId, photoId);
  const updateMark = useUpdateMark(workshopId, photoId);
  const deleteMark = useDeleteMark(workshopId, photoId);
  const deletePhoto = useDeletePhoto(workshopId, photoId);

  const mayMark = can(actor, 'create', 'mark');
  const mayChange = (m: Mark) => can(actor, 'update', 'mark', { ownerId: m.authorId ?? '' });
  const mayDelete = (m: Mark) => can(actor, 'delete', 'mark', { ownerId: m.authorId ?? '' });
  const mayEditPhoto =
    can(actor, 'update', 'heat', { ownerId: photo.casterId ?? '' }) || can(actor, 'delete', 'photo', { ownerId: photo.uploadedBy ?? '' });
  const mayDeletePhoto = can(actor, 'delete', 'photo', { ownerId: photo.uploadedBy ?? '' });

  const selected = marks.find((m) => m.id === selectedId) ?? null;

  const startMarking = (at?: Point) => {
    setMarking(true);
    if (at) setCursor(at);
    setDraft(null);
    // The surface mounts with marking mode; focus it once it is there.
    requestAnimationFrame(() => surfaceRef.current?.focus());
  };
  const stopMarking = () => {
    setMarking(false);
    setDraft(null);
    setPicking(null);
    requestAnimationFrame(() => markButtonRef.current?.focus());
  };
  const openPickerAt = (geometry: MarkGeometry) => {
    setDraft(geometry);
    setProblem(null);
    setPicking({ mode: 'create', geometry });
  };
  const closePicker = () => {
    setPicking(null);
    setDraft(null);
    setProblem(null);
  };
  /** When zoomed in, brings a mark to the middle of the view at the same zoom. */
  const centreOn = (mark: NumberedMark) => {
    const zoom = zoomRef.current;
    const content = zoom?.instance.contentComponent;
    const scale = zoom?.instance.state.scale ?? 1;
    if (!zoom || !content || scale <= 1.01) return;
    const { x, y } = markCentre(mark);
    const w = content.offsetWidth;
    const h = content.offsetHeight;
    const inside = (v: number, size: number) => Math.min(0, Math.max(size - size * scale, v));
    void zoom.setTransform(inside(w / 2 - x * w * scale, w), inside(h / 2 - y * h * scale, h), scale, 200);
  };
  const select = (id: string | null) => {
    setSelectedId(id);
    const mark = marks.find((m) => m.id === id);
    if (mark) centreOn(mark);
  };
  const step = (by: 1 | -1) => {
    if (!marks.length) return;
    const index = selected ? marks.indexOf(selected) : by === 1 ? -1 : 0;
    select(marks[(index + by + marks.length) % marks.length].id);
  };
  const askDelete = (mark: NumberedMark) => {
    setProblem(null);
    setConfirming(mark);
  };

  // Shortcuts for the whole page while it is open; never while typing or inside a dialog.
  const onShortcut = useEffectEvent((event: KeyboardEvent) => {
    if (event.defaultPrevented || event.ctrlKey || event.metaKey || event.altKey) return;
    if (isTyping(event.target) || picking || confirming || confirmPhotoDelete) return;
    if (event.target instanceof HTMLElement && event.target.closest('dialog')) return;
    const zoom = zoomRef.current;
    switch (event.key) {
      case 'm':
      case 'M':
        if (!mayMark) return;
        event.preventDefault();
        startMarking(selected ? markCentre(selected) : cursor);
        return;
      case '/':
        if (!mayMark) return;
        event.preventDefault();
        setMarking(true);
        openPickerAt({ shape: 'point', x: cursor.x, y: cursor.y });
        return;
      case '[':
      case 'k':
        event.preventDefault();
        step(-1);
        return;
      case ']':
      case 'j':
        event.preventDefault();
        step(1);
        return;
      case 'e':
        if (selected && mayChange(selected)) {
          event.preventDefault();
          setPicking({ mode: 'edit', mark: selected });
        }
        return;
      case 'Delete':
      case 'Backspace':
        if (selected && mayDelete(selected)) {
          event.preventDefault();
          askDelete(selected);
        }
        return;
      case '+':
      case '=':
        event.preventDefault();
        void zoom?.zoomIn(0.5);
        return;
      case '-':
        event.preventDefault();
        void zoom?.zoomOut(0.5);
        return;
      case '0':
        event.preventDefault();
        void zoom?.resetTransform();
        return;
      case 'Escape':
        if (marking) {
          event.preventDefault();
          stopMarking();
        } else if (selectedId) {
          event.preventDefault();
          setSelectedId(null);
        }
        return;
    }
  });
  useEffect(() => {
    const listener = (event: KeyboardEvent) => onShortcut(event);
    document.addEventListener('keydown', listener);
    return () => document.removeEventListener('keydown', listener);
  }, []);

  const save = (choice: MarkChoice) => {
    if (!picking) return;
    setProblem(null);
    if (picking.mode === 'create') {
      const g = picking.geometry;
      createMark.mutate(
        { kind: choice.kind, severity: choice.severity, note: choice.note || undefined, ...g },
        {
          onSuccess: (mark) => {
            const name = findDefectKind(mark.kind)?.shortName ?? mark.kind;
            toast.success(`Mark ${marks.length + 1} saved: ${name}.`);
            setSelectedId(mark.id);
            setCursor(markCentre({ ...mark }));
            closePicker();
            requestAnimationFrame(() => surfaceRef.current?.focus());
          },
          onError: (error) => setProblem(errorMessage(error)),
        },
      );
    } else {
      const { mark } = picking;
      updateMark.mutate(
        { markId: mark.id, input: { kind: choice.kind, severity: choice.severity, note: choice.note || null } },
        {
          onSuccess: () => {
            toast.success(`Mark ${mark.number} changed.`);
            closePicker();
          },
          onError: (error) => setProblem(errorMessage(error)),
        },
      );
    }
  };

  const confirmDelete = () => {
    if (!confirming) return;
    const mark = confirming;
    deleteMark.mutate(mark.id, {
      onSuccess: () => {
        toast.success(`Mark ${mark.number} deleted.`);
        setConfirming(null);
        setSelectedId(null);
      },
      onError: (error) => setProblem(errorMessage(error)),
    });
  };

  const caption = [
    photo.casterName ? `cast by ${photo.casterName}` : null,
    photo.alloy,
    photo.mouldMaterial ? `${MOLD_MATERIAL_LABELS[photo.mouldMaterial]} mould` : null,
    `added ${formatDateTime(photo.createdAt)}`,
  ]
    .filter(Boolean)
    .join(' · ');
  const title = photoLabel(photo);

  return (
    <div className="flex flex-col gap-4">
      <header className="flex flex-col gap-1">
        <nav aria-label="Where this photo belongs" className="flex flex-wrap gap-x-4 gap-y-1 text-caption">
          <TextLink to={paths.gallery.getHref(workshopId)}>Gallery</TextLink>
          <TextLink to={paths.casting.getHref(workshopId, photo.heatId, photo.castingId)}>This photo’s casting</TextLink>
        </nav>
        <h1 className="text-heading font-semibold text-ink">{title}</h1>
        <p className="text-body text-ink-muted">{caption}</p>
        {photo.notes ? <p className="max-w-prose text-body whitespace-pre-line text-ink">{photo.notes}</p> : null}
      </header>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_19rem] 2xl:grid-cols-[minmax(0,1fr)_24rem]">
        <section aria-label="Photo" className="flex min-w-0 flex-col gap-3">
          {mayMark ? (
            <div className="flex flex-wrap items-center gap-3">
              <Button
                ref={markButtonRef}
                variant={marking ? 'secondary' : 'primary'}
                aria-pressed={marking}
                icon={marking ? <X aria-hidden className="size-5" /> : <Crosshair aria-hidden className="size-5" />}
                onClick={() => (marking ? stopMarking() : startMarking())}
              >
                {marking ? 'Done marking' : 'Mark a defect'}
              </Button>
              <p className="text-body text-ink-muted" aria-live="polite">
                {marking
                  ? 'Tap the defect for a spot, or drag a box around it. Pan and pinch are paused while you mark.'
                  : 'Pinch or use the buttons to zoom; drag to move around.'}
              </p>
            </div>
          ) : null}
          <PhotoViewer
            photo={photo}
            alt={`${title}${marks.length ? `, with ${marks.length} ${marks.length === 1 ? 'mark' : 'marks'} listed under “Marks”` : ''}`}
            marks={marks}
            selectedId={selectedId}
            highlightId={highlightId}
            marking={marking}
            draft={draft}
            cursor={cursor}
            onCursorChange={setCursor}
            onDraft={openPickerAt}
            onSelectMark={(id) => setSelectedId((current) => (current === id ? null : id))}
            zoomRef={zoomRef}
            surfaceRef={surfaceRef}
          />
        </section>

        <aside className="flex flex-col gap-5" aria-label="Marks and details">
          <section aria-labelledby="marks-heading" className="flex flex-col gap-2">
            <h2 id="marks-heading" className="text-title font-semibold text-ink">
              Marks <span className="figures text-body font-normal text-ink-muted">({marks.length})</span>
            </h2>
            <MarkList
              marks={marks}
              selectedId={selectedId}
              onSelect={(id) => select(id === selectedId ? null : id)}
              onHighlight={setHighlightId}
              canChange={mayChange}
              canDelete={mayDelete}
              onEdit={(mark) => {
                setProblem(null);
                setPicking({ mode: 'edit', mark });
              }}
              onDelete={askDelete}
              currentUserId={actor.id}
            />
          </section>

          <details className="rounded-md border border-line bg-surface-raised">
            <summary className="flex min-h-12 cursor-pointer items-center gap-2 px-3 text-body font-medium lg:min-h-10">
              <Keyboard aria-hidden className="size-5" />
              Keyboard shortcuts
            </summary>
            <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-2 px-3 pb-3 text-caption">
              {PHOTO_SHORTCUTS.map((s) => (
                <div key={s.what} className="contents">
                  <dt className="flex gap-1">
                    {s.keys.map((k) => (
                      <kbd key={k} className="figures rounded border border-line-strong bg-surface-sunken px-1.5 text-ink">
                        {k}
                      </kbd>
                    ))}
                  </dt>
                  <dd className="text-ink">{s.what}</dd>
                </div>
              ))}
            </dl>
          </details>

          {mayEditPhoto || mayDeletePhoto ? (
            <section aria-labelledby="details-heading" className="flex flex-col gap-2">
              <h2 id="details-heading" className="text-title font-semibold text-ink">
                Photo details
              </h2>
              {editingDetails ? (
                <PhotoDetailsForm workshopId={workshopId} photo={photo} onDone={() => setEditingDetails(false)} />
              ) : (
                <div className="flex flex-wrap gap-2">
                  {mayEditPhoto ? (
                    <Button size="sm" icon={<Pencil aria-hidden className="size-4" />} onClick={() => setEditingDetails(true)}>
                      Edit title and notes
                    </Button>
                  ) : null}
                  {mayDeletePhoto ? (
                    <Button size="sm" variant="danger" icon={<Trash2 aria-hidden className="size-4" />} onClick={() => setConfirmPhotoDelete(true)}>
                      Delete photo
                    </Button>
                  ) : null}
                </div>
              )}
              {photo.fileName ? (
                <p className="text-caption text-ink-muted">
                  Uploaded as <span className="break-all">{photo.fileName}</span>
                  {photo.capturedAt ? `, taken ${formatDateTime(photo.capturedAt)}` : ''}.
                </p>
              ) : null}
            </section>
          ) : null}
        </aside>
      </div>

      {picking ? (
        <DefectPicker
          key={picking.mode === 'edit' ? picking.mark.id : 'new'}
          title={picking.mode === 'edit' ? `Change mark ${picking.mark.number}` : 'Mark a defect'}
          saveLabel={picking.mode === 'edit' ? 'Save changes' : 'Save mark'}
          initial={
            picking.mode === 'edit'
              ? { kind: picking.mark.kind, severity: picking.mark.severity, note: picking.mark.note ?? '' }
              : undefined
          }
          pending={createMark.isPending || updateMark.isPending}
          problem={problem}
          onSave={save}
          onCancel={closePicker}
        />
      ) : null}

      {confirming ? (
        <ConfirmDialog
          title={`Delete mark ${confirming.number}?`}
          confirmLabel="Delete mark"
          pending={deleteMark.isPending}
          problem={problem}
          onConfirm={confirmDelete}
          onCancel={() => setConfirming(null)}
        >
          <p>
            Mark {confirming.number}, {findDefectKind(confirming.kind)?.name ?? confirming.kind}, goes from this photo for everyone. This
            cannot be undone.
          </p>
        </ConfirmDialog>
      ) : null}

      {confirmPhotoDelete ? (
        <ConfirmDialog
          title="Delete this photo?"
          confirmLabel="Delete photo"
          pending={deletePhoto.isPending}
          problem={problem}
          onConfirm={() =>
            deletePhoto.mutate(undefined, {
              onSuccess: () => {
                toast.success('Photo deleted.');
                navigate(paths.casting.getHref(workshopId, photo.heatId, photo.castingId), { replace: true });
              },
              onError: (error) => setProblem(errorMessage(error)),
            })
          }
          onCancel={() => setConfirmPhotoDelete(false)}
        >
          <p>
            The photo and its {marks.length} {marks.length === 1 ? 'mark' : 'marks'} go for everyone in the workshop. This cannot be undone.
          </p>
        </ConfirmDialog>
      ) : null}
      <span className="sr-only" aria-live="polite">
        {selected ? `Mark ${selected.number} selected: ${findDefectKind(selected.kind)?.name ?? selected.kind}` : ''}
      </span>
    </div>
  );
}
