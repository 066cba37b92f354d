import { describe, expect, it } from 'vitest';
import type { Request } from 'express';
import { rejectUnstorableText, unstorableTextPaths } from '../../../server/middleware/storable-text';

describe('text PostgreSQL cannot store', () => {
  it('when a value or a key holds NUL or an unpaired surrogate, then its path is named', () => {
    const body = {
      note: 'fine',
      entries: { pH: { note: 'a\u0000b' } },
      list: ['ok', '\uD800'],
      ['k\u0000']: 1,
    };
    expect(unstorableTextPaths(body, '').sort()).toEqual(['(root)', 'entries.pH.note', 'list.1']);
  });

  it('when the text is unusual but well-formed (emoji, combining marks, right-to-left marks), then nothing is named', () => {
    expect(unstorableTextPaths({ name: '🐠 e\u0301 \u202E Ω', details: { ключ: 'значение' } }, '')).toEqual(
      [],
    );
  });

  it('when a body is nested 100,000 levels deep, then it is walked without overflowing the stack', () => {
    let deep: unknown = '\u0000';
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(unstorableTextPaths({ a: deep }, 'query')).toHaveLength(1);
  });

  it('when a path segment decodes to NUL, then the request is refused naming the params; a malformed escape is left to the router', () => {
    const outcome = (path: string) => {
      let passed: unknown = 'not called';
      rejectUnstorableText()(
        { path, body: undefined, query: {} } as unknown as Request,
        { locals: {} } as never,
        (err?: unknown) => (passed = err),
      );
      return passed as { status?: number; issues?: { path: string }[] } | undefined;
    };
    expect(outcome('/clubs/x/care-profiles/%00')).toMatchObject({
      status: 400,
      issues: [{ path: 'params' }],
    });
    expect(outcome('/clubs/x/care-profiles/%E0%A4%A')).toBeUndefined();
    expect(outcome('/clubs/x/care-profiles/reef%20tank')).toBeUndefined();
  });

  it('when a route checks a field itself, then the guard leaves that field to it and still checks the others', () => {
    const outcome = (body: unknown) => {
      let passed: unknown = 'not called';
      rejectUnstorableText({ ownRules: ['csv'] })(
        { path: '/x', body, query: {} } as unknown as Request,
        { locals: {} } as never,
        (err?: unknown) => (passed = err),
      );
      return passed as { issues?: { path: string }[] } | undefined;
    };
    expect(outcome({ csv: 'date,pH\u0000\n' })).toBeUndefined();
    expect(outcome({ csv: 'date,pH\n', timeZone: 'a\u0000' })).toMatchObject({
      issues: [{ path: 'timeZone' }],
    });
  });
});
