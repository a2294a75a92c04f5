// @mentions in a comment: a member picker sends user ids, and someone typing
// "@Priya Shah" by hand is found by display name. Matching is on whole names,
// case-insensitive, longest name first so "@Ann Lee" is not also "@Ann".

export type Mentionable = { userId: string; displayName: string };

const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The members named as `@Display Name` in `text`, each once, in the order of `members`. */
export function mentionedByName(text: string, members: readonly Mentionable[]): string[] {
  const found: string[] = [];
  let rest = text;
  const longestFirst = [...members].filter((m) => m.displayName.trim()).sort((a, b) => b.displayName.length - a.displayName.length);
  for (const m of longestFirst) {
    // After the name: end, whitespace or punctuation, never another letter or digit.
    const source = `(^|[^\\p{L}\\p{N}_])@${escapeRegExp(m.displayName.trim())}(?![\\p{L}\\p{N}])`;
    if (new RegExp(source, 'iu').test(rest)) {
      found.push(m.userId);
      rest = rest.replace(new RegExp(source, 'giu'), '$1');
    }
  }
  return members.filter((m) => found.includes(m.userId)).map((m) => m.userId);
}
