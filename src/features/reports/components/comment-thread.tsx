import { useState, type FormEvent } from 'react';
import type { Comment, CommentCreateInput, CommentUpdateInput } from '#shared/reports/comment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { formatDateTime } from '#src/lib/format.ts';
import type { ReportMark } from '../lib/numbered-marks.ts';

export type MentionCandidate = { userId: string; displayName: string };

type CommentThreadProps = {
  comments: readonly Comment[];
  marks: readonly ReportMark[];
  members: readonly MentionCandidate[];
  currentUserId: string;
  highlightMarkId?: string | null;
  onShowMark: (markId: string) => void;
  onPost: (input: CommentCreateInput) => Promise<unknown>;
  onEdit: (commentId: string, input: CommentUpdateInput) => Promise<unknown>;
  /** Clock for the edit window (tests). */
  now?: () => number;
};

/** A report's comments, threaded, with a reply box on each and one for a new comment. */
export function CommentThread({ comments, marks, members, currentUserId, highlightMarkId, onShowMark, onPost, onEdit, now = Date.now }: CommentThreadProps) {
  const roots = comments.filter((c) => !c.parentId || !comments.some((p) => p.id === c.parentId));
  const repliesOf = (id: string) => comments.filter((c) => c.parentId === id);
  const shared = { marks, members, currentUserId, highlightMarkId, onShowMark, onPost, onEdit, now };
  return (
    <section aria-labelledby="comments-heading" className="flex flex-col gap-3" data-testid="comments">
      <h2 id="comments-heading" className="text-title font-semibold text-ink">
        Comments <span className="font-mono text-body tabular-nums text-ink-muted">({comments.length})</span>
      </h2>
      {roots.length === 0 ? <p className="text-body text-ink-muted">No comments yet. Pick a mark to point at the spot you mean.</p> : null}
      <ol className="flex flex-col gap-3">
        {roots.map((c) => (
          <li key={c.id}>
            <CommentItem comment={c} {...shared} />
            {repliesOf(c.id).length > 0 ? (
              <ol className="mt-2 ml-4 flex flex-col gap-2 border-l-2 border-line pl-3" aria-label="Replies">
                {repliesOf(c.id).map((r) => (
                  <li key={r.id}>
                    <CommentItem comment={r} {...shared} />
                  </li>
                ))}
              </ol>
            ) : null}
          </li>
        ))}
      </ol>
      <CommentForm label="Add a comment" submitLabel="Post the comment" marks={marks} members={members} onSubmit={(input) => onPost(input)} />
    </section>
  );
}

function CommentItem({
  comment,
  marks,
  members,
  currentUserId,
  highlightMarkId,
  onShowMark,
  onPost,
  onEdit,
  now,
}: Omit<CommentThreadProps, 'comments' | 'now'> & { comment: Comment; now: () => number }) {
  const [mode, setMode] = useState<'read' | 'reply' | 'edit'>('read');
  const mark = marks.find((m) => m.id === comment.markId);
  const editable = comment.authorId === currentUserId && Date.parse(comment.editableUntil) > now();
  return (
    <article className="flex flex-col gap-2 rounded-md border border-line bg-surface-raised p-3" data-testid="comment" data-comment-id={comment.id}>
      <header className="flex flex-wrap items-baseline gap-x-2 text-caption text-ink-muted">
        <span className="font-semibold text-ink">{comment.authorName ?? 'A former member'}</span>
        <time dateTime={comment.createdAt}>{formatDateTime(comment.createdAt)}</time>
        {comment.editedAt ? <span>(edited)</span> : null}
      </header>
      {mark ? (
        <Button
          size="sm"
          variant="secondary"
          className="self-start"
          aria-pressed={highlightMarkId === mark.id}
          onClick={() => onShowMark(mark.id)}
        >
          On {mark.label}: show it on the photo
        </Button>
      ) : null}
      {mode === 'edit' ? (
        <CommentForm
          label="Edit the comment"
          submitLabel="Save the change"
          initialBody={comment.body}
          members={members}
          marks={[]}
          onSubmit={async ({ body, mentionIds }) => {
            await onEdit(comment.id, { body, mentionIds });
            setMode('read');
          }}
          onCancel={() => setMode('read')}
        />
      ) : (
        // Only the server's rendered, sanitised HTML goes in here (markdown-lite, raw HTML off).
        <div className="prose-comment text-body text-ink" dangerouslySetInnerHTML={{ __html: comment.html }} />
      )}
      {mode === 'read' ? (
        <div className="flex flex-wrap gap-2">
          <Button size="sm" variant="quiet" onClick={() => setMode('reply')}>
            Reply
          </Button>
          {editable ? (
            <Button size="sm" variant="quiet" onClick={() => setMode('edit')}>
              Edit
            </Button>
          ) : null}
        </div>
      ) : null}
      {mode === 'reply' ? (
        <CommentForm
          label={`Reply to ${comment.authorName ?? 'this comment'}`}
          submitLabel="Post the reply"
          marks={marks}
          members={members}
          onSubmit={async (input) => {
            await onPost({ ...input, parentId: comment.id });
            setMode('read');
          }}
          onCancel={() => setMode('read')}
        />
      ) : null}
    </article>
  );
}

function CommentForm({
  label,
  submitLabel,
  initialBody = '',
  marks,
  members,
  onSubmit,
  onCancel,
}: {
  label: string;
  submitLabel: string;
  initialBody?: string;
  marks: readonly ReportMark[];
  members: readonly MentionCandidate[];
  onSubmit: (input: CommentCreateInput) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [body, setBody] = useState(initialBody);
  const [markId, setMarkId] = useState('');
  const [mentionIds, setMentionIds] = useState<string[]>([]);
  const [error, setError] = useState<string>();
  const [pending, setPending] = useState(false);

  const mention = (userId: string) => {
    const member = members.find((m) => m.userId === userId);
    if (!member) return;
    setMentionIds((ids) => (ids.includes(userId) ? ids : [...ids, userId]));
    setBody((b) => `${b}${b && !b.endsWith(' ') ? ' ' : ''}@${member.displayName} `);
  };

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!body.trim()) return setError('Write something');
    setError(undefined);
    setPending(true);
    try {
      await onSubmit({ body, ...(markId ? { markId } : {}), ...(mentionIds.length ? { mentionIds } : {}) });
      setBody('');
      setMarkId('');
      setMentionIds([]);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'Not posted');
    } finally {
      setPending(false);
    }
  };

  return (
    <form onSubmit={submit} className="flex flex-col gap-2">
      <TextareaField label={label} hint="**bold**, *italic*, lists and links work. @Name mentions a member." rows={3} value={body} onChange={(e) => setBody(e.target.value)} error={error} />
      <div className="flex flex-wrap gap-3">
        {marks.length > 0 ? (
          <SelectField label="About a mark" value={markId} onChange={(e) => setMarkId(e.target.value)}>
            <option value="">No mark</option>
            {marks.map((m) => (
              <option key={m.id} value={m.id}>
                {m.label}
              </option>
            ))}
          </SelectField>
        ) : null}
        {members.length > 0 ? (
          <SelectField label="Mention a member" value="" onChange={(e) => mention(e.target.value)}>
            <option value="">Pick…</option>
            {members.map((m) => (
              <option key={m.userId} value={m.userId}>
                {m.displayName}
              </option>
            ))}
          </SelectField>
        ) : null}
      </div>
      <div className="flex gap-2">
        <Button type="submit" variant="secondary" pending={pending} pendingLabel="Posting…">
          {submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
