import { describe, expect, it } from 'vitest';
import { insertMention, mentionAtCaret } from '@client/features/questions/lib/mention-query';
import { mentionedIn } from '@shared/questions/mentions';

const people = [
  { userId: 'ana', displayName: 'Ana' },
  { userId: 'ana-lee', displayName: 'Ana Lee' },
  { userId: 'milo', displayName: 'Milo Mentor' },
];

describe('mentions', () => {
  it('when a message names people with @, then each is found once, the longer name winning', () => {
    expect(mentionedIn('@Ana Lee, what do you think? cc @milo mentor.', people).sort()).toEqual([
      'ana-lee',
      'milo',
    ]);
    expect(mentionedIn('@Ana and @Ana Lee', people).sort()).toEqual(['ana', 'ana-lee']);
    expect(mentionedIn('email ana@club.example or @Anastasia', people)).toEqual([]);
  });

  it('when typing @ and part of a name, then the partial is found and replaced by the full name', () => {
    const text = 'Thanks @Mi';
    const at = mentionAtCaret(text, text.length);
    expect(at).toEqual({ start: 7, query: 'Mi' });
    expect(insertMention(text, at!, 'Milo Mentor')).toEqual({ text: 'Thanks @Milo Mentor ', caret: 20 });
    expect(mentionAtCaret('mail me@home', 12)).toBeNull();
  });
});
