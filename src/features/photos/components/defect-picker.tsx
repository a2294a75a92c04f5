import { Search } from 'lucide-react';
import { useDeferredValue, useId, useRef, useState, type FormEvent, type KeyboardEvent } from 'react';
import { DEFECT_GROUP_LOOK } from '#src/config/defect-groups.ts';
import { findDefectKind, type DefectKindId } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { controlClasses } from '#src/components/ui/field-parts.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { cn } from '#src/lib/cn.ts';
import { searchDefectKinds } from '../lib/defect-search.ts';
import { GroupShape } from './group-shape.tsx';
import { ModalDialog } from './modal-dialog.tsx';

export type Severity = 1 | 2 | 3;
export type MarkChoice = { kind: DefectKindId; severity: Severity; note: string };

export const SEVERITY_OPTIONS = [
  { value: '1', label: '1 Slight', description: 'Cosmetic; the casting is still usable.' },
  { value: '2', label: '2 Clear', description: 'Worth fixing before the next pour.' },
  { value: '3', label: '3 Serious', description: 'The casting is scrap or unsafe to use.' },
] as const;
export const SEVERITY_WORDS: Record<Severity, string> = { 1: 'slight', 2: 'clear', 3: 'serious' };

type DefectPickerProps = {
  title: string;
  initial?: Partial<MarkChoice>;
  saveLabel: string;
  pending?: boolean;
  problem?: string | null;
  onSave: (choice: MarkChoice) => void;
  onCancel: () => void;
};

/**
 * Choosing what a mark is: a forgiving search over the defect vocabulary
 * (names, label names and everyday words), each kind with its one-line "how
 * to recognise it"; then severity 1–3 and a note. "/" jumps back to the search.
 */
export function DefectPicker({ title, initial, saveLabel, pending, problem, onSave, onCancel }: DefectPickerProps) {
  const searchId = useId();
  const noteId = useId();
  const listName = useId();
  const [query, setQuery] = useState('');
  const deferredQuery = useDeferredValue(query);
  const [kind, setKind] = useState<DefectKindId | null>(initial?.kind ?? null);
  const [severity, setSeverity] = useState<Severity>(initial?.severity ?? 2);
  const [note, setNote] = useState(initial?.note ?? '');
  const [missingKind, setMissingKind] = useState(false);
  const searchRef = useRef<HTMLInputElement | null>(null);
  const listRef = useRef<HTMLDivElement | null>(null);

  const results = searchDefectKinds(deferredQuery);
  const chosen = kind ? findDefectKind(kind) : undefined;
  const chosenHidden = chosen && !results.some((k) => k.id === chosen.id);

  const focusOption = (id: DefectKindId) =>
    listRef.current?.querySelector<HTMLInputElement>(`input[value="${id}"]`)?.focus();

  const onSearchKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    const top = searchDefectKinds(query)[0];
    if (event.key === 'Enter') {
      // Enter takes the best match rather than sending the form half-filled.
      event.preventDefault();
      if (top) {
        setKind(top.id);
        setMissingKind(false);
        requestAnimationFrame(() => focusOption(top.id));
      }
    } else if (event.key === 'ArrowDown' && top) {
      event.preventDefault();
      focusOption(kind && results.some((k) => k.id === kind) ? kind : top.id);
    }
  };

  const onDialogKeyDown = (event: KeyboardEvent<HTMLDialogElement>) => {
    const target = event.target as HTMLElement;
    const typing = target.tagName === 'TEXTAREA' || (target.tagName === 'INPUT' && (target as HTMLInputElement).type !== 'radio');
    if (event.key === '/' && !typing) {
      event.preventDefault();
      searchRef.current?.focus();
      searchRef.current?.select();
    }
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!kind) {
      setMissingKind(true);
      searchRef.current?.focus();
      return;
    }
    onSave({ kind, severity, note: note.trim() });
  };

  return (
    <ModalDialog title={title} onClose={onCancel} onKeyDown={onDialogKeyDown} closeLabel="Cancel">
      <form noValidate onSubmit={submit} className="flex flex-col gap-4 p-4">
        {problem ? (
          <Notice tone="danger" role="alert" title="Mark not saved">
            {problem}
          </Notice>
        ) : null}
        <div className="flex flex-col gap-1.5">
          <label htmlFor={searchId} className="text-body font-medium text-ink">
            Find the defect
          </label>
          <p id={`${searchId}-hint`} className="text-caption text-ink-muted">
            Trade names or everyday words: “bubbles”, “crack”, “divot”. Enter takes the best match.
          </p>
          <div className="relative">
            <Search aria-hidden className="pointer-events-none absolute top-1/2 left-3 size-5 -translate-y-1/2 text-ink-muted" />
            <input
              ref={searchRef}
              data-autofocus={initial?.kind ? undefined : true}
              id={searchId}
              type="search"
              autoComplete="off"
              autoCapitalize="none"
              spellCheck={false}
              enterKeyHint="done"
              value={query}
              onChange={(e) => setQuery(e.target.value)}
              onKeyDown={onSearchKeyDown}
              aria-describedby={`${searchId}-hint${missingKind ? ` ${searchId}-error` : ''}`}
              aria-invalid={missingKind || undefined}
              aria-controls={listName}
              className={cn(controlClasses, 'pl-10')}
            />
          </div>
          {missingKind ? (
            <p id={`${searchId}-error`} className="text-caption font-medium text-danger">
              Choose which defect this is.
            </p>
          ) : null}
        </div>

        <fieldset className="flex flex-col gap-1.5">
          <legend className="mb-1.5 text-body font-medium text-ink">
            Defect{' '}
            <span className="text-caption font-normal text-ink-muted" aria-live="polite">
              ({results.length} {results.length === 1 ? 'match' : 'matches'})
            </span>
          </legend>
          {chosenHidden ? (
            <p className="text-caption text-ink-muted">
              Chosen: <strong className="text-ink">{chosen.name}</strong>
            </p>
          ) : null}
          <div
            id={listName}
            ref={listRef}
            className="flex max-h-[40dvh] flex-col gap-1 overflow-y-auto rounded-md border border-line p-1 lg:max-h-72"
          >
            {results.length === 0 ? (
              <p className="p-3 text-body text-ink-muted">Nothing matches “{query}”. Try another word, such as “hole”, “crack” or “rough”.</p>
            ) : (
              results.map((k) => {
                const look = DEFECT_GROUP_LOOK[k.group];
                const checked = k.id === kind;
                return (
                  <label
                    key={k.id}
                    className={cn(
                      'flex min-h-12 cursor-pointer items-start gap-3 rounded-md p-2',
                      'has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-[-2px] has-[:focus-visible]:outline-focus',
                      checked ? 'bg-surface-sunken shadow-[inset_3px_0_0_var(--ps-ink)]' : 'hover:bg-surface-sunken',
                    )}
                  >
                    <input
                      type="radio"
                      name={listName}
                      value={k.id}
                      checked={checked}
                      data-autofocus={checked && initial?.kind === k.id ? true : undefined}
                      onChange={() => {
                        setKind(k.id);
                        setMissingKind(false);
                      }}
                      className="mt-1.5 size-5 shrink-0 accent-[var(--ps-ink)]"
                    />
                    <GroupShape group={k.group} className="mt-0.5" />
                    <span className="flex min-w-0 flex-col">
                      <span className="text-body font-semibold text-ink">
                        {k.name}{' '}
                        <span className={cn('figures text-caption font-bold', look.colorClass)}>{look.code}</span>
                        <span className="text-caption font-normal text-ink-muted"> · {look.label}</span>
                      </span>
                      <span className="text-caption text-ink-muted">{k.recognise}</span>
                    </span>
                  </label>
                );
              })
            )}
          </div>
        </fieldset>

        <SegmentedControl
          legend="Severity"
          options={SEVERITY_OPTIONS}
          value={String(severity) as '1' | '2' | '3'}
          onChange={(v) => setSeverity(Number(v) as Severity)}
        />
        <p className="-mt-2 text-caption text-ink-muted">
          {SEVERITY_OPTIONS.find((o) => o.value === String(severity))?.description}
        </p>

        <div className="flex flex-col gap-1.5">
          <label htmlFor={noteId} className="text-body font-medium text-ink">
            Note <span className="font-normal text-ink-muted">(optional)</span>
          </label>
          <textarea
            id={noteId}
            value={note}
            maxLength={2000}
            rows={2}
            onChange={(e) => setNote(e.target.value)}
            className={cn(controlClasses, 'py-2')}
            placeholder="What you see, e.g. only on the face against the sprue"
          />
        </div>

        {/* Stays in view at the foot of the sheet, however long the list. */}
        <div className="sticky bottom-0 -mx-4 -mb-4 flex flex-wrap justify-end gap-3 border-t border-line bg-surface-raised px-4 py-3">
          <Button onClick={onCancel}>Cancel</Button>
          <Button type="submit" variant="primary" pending={pending} pendingLabel="Saving…">
            {saveLabel}
          </Button>
        </div>
      </form>
    </ModalDialog>
  );
}
