import { describe, expect, test } from 'vitest';
import { mentionedByName } from './mentions.ts';

const members = [
  { userId: 'u-ann', displayName: 'Ann' },
  { userId: 'u-ann-lee', displayName: 'Ann Lee' },
  { userId: 'u-priya', displayName: 'Priya Shah' },
];

describe('mentionedByName', () => {
  test.each([
    ['a full name', 'thanks @Priya Shah!', ['u-priya']],
    ['another case', 'cc @priya shah', ['u-priya']],
    ['the longer of two names', '@Ann Lee could you look', ['u-ann-lee']],
    ['both names', '@Ann and @Ann Lee', ['u-ann', 'u-ann-lee']],
    ['a name run into other letters', '@Annabel', []],
    ['an e-mail address', 'write to ann@Ann.test', []],
    ['no @ at all', 'Priya Shah said so', []],
  ])('when a comment has %s, then the mentioned members are found', (_what, text, ids) => {
    expect(mentionedByName(text, members)).toEqual(ids);
  });
});
