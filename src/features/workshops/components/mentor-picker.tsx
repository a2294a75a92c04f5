import { ChevronDown } from 'lucide-react';
import type { Member } from '#shared/workshops/workshop-schemas.ts';

type MentorPickerProps = {
  student: Member;
  mentors: readonly Member[];
  onChange: (mentorIds: string[]) => void;
  disabled?: boolean;
};

/** Chooses a student's mentors: a disclosure with one checkbox per mentor. */
export function MentorPicker({ student, mentors, onChange, disabled }: MentorPickerProps) {
  const chosen = mentors.filter((m) => student.mentorIds.includes(m.userId));
  if (mentors.length === 0) {
    return <p className="text-caption text-ink-muted">No mentors in this workshop yet. Give a member the Mentor role, or invite one.</p>;
  }
  return (
    <details className="group">
      <summary className="flex min-h-12 cursor-pointer list-none items-center gap-2 rounded-md border border-line-strong bg-surface-raised px-3 text-body lg:min-h-10 [&::-webkit-details-marker]:hidden">
        <span className="min-w-0 flex-1 truncate">
          <span className="sr-only">Mentors for {student.displayName}: </span>
          {chosen.length > 0 ? chosen.map((m) => m.displayName).join(', ') : 'No mentor yet'}
        </span>
        <ChevronDown aria-hidden className="size-4 shrink-0 text-ink-muted group-open:rotate-180" />
      </summary>
      <fieldset className="mt-2 flex flex-col gap-1 rounded-md border border-line bg-surface-raised p-2" disabled={disabled}>
        <legend className="sr-only">Mentors for {student.displayName}</legend>
        {mentors.map((mentor) => {
          const checked = student.mentorIds.includes(mentor.userId);
          return (
            <label key={mentor.userId} className="flex min-h-12 cursor-pointer items-center gap-3 rounded px-2 hover:bg-surface-sunken lg:min-h-10">
              <input
                type="checkbox"
                className="size-5 accent-ink"
                checked={checked}
                onChange={() =>
                  onChange(checked ? student.mentorIds.filter((id) => id !== mentor.userId) : [...student.mentorIds, mentor.userId])
                }
              />
              {mentor.displayName}
            </label>
          );
        })}
      </fieldset>
    </details>
  );
}
