import { describe, expect, it } from 'vitest';
import { unstorableTextPaths } from '../../../server/middleware/storable-text';

describe('text PostgreSQL cannot store', () => {
  it('when a value or a key holds NUL or an unpaired surrogate, then its path is named', () => {
    const body = { note: 'fine', entries: { pH: { note: 'a\u0000b' } }, list: ['ok', '\uD800'], ['k\u0000']: 1 };
    expect(unstorableTextPaths(body, '').sort()).toEqual(['(root)', 'entries.pH.note', 'list.1']);
  });

  it('when the text is unusual but well-formed (emoji, combining marks, right-to-left marks), then nothing is named', () => {
    expect(unstorableTextPaths({ name: '🐠 e\u0301 \u202E Ω', details: { 'ключ': 'значение' } }, '')).toEqual([]);
  });

  it('when a body is nested 100,000 levels deep, then it is walked without overflowing the stack', () => {
    let deep: unknown = '\u0000';
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(unstorableTextPaths({ a: deep }, 'query')).toHaveLength(1);
  });
});
