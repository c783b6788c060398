import { describe, expect, it } from 'vitest';
import { conflict, DomainError, type ErrorKind, notFound } from '../services/errors';
import { HttpError, toApiError } from './errors';

describe('domain errors as HTTP answers', () => {
  it('answers each kind with the status the API has always used for it', () => {
    const statuses: [ErrorKind, number][] = [
      ['malformed', 400],
      ['forbidden', 403],
      ['not_found', 404],
      ['conflict', 409],
      ['archived', 409],
      ['expired', 410],
      ['too_large', 413],
      ['unsupported', 415],
      ['invalid', 422],
      ['unavailable', 503],
    ];
    for (const [kind, status] of statuses)
      expect(toApiError(new DomainError(kind, 'some_code', 'why')).status, kind).toBe(status);
  });

  it('writes the one error shape: code, message, fields when given, and the extra body beside it', () => {
    expect(toApiError(notFound('assembly'))).toEqual({
      status: 404,
      body: { error: { code: 'not_found', message: 'assembly not found' } },
    });
    expect(toApiError(conflict('version_conflict', 'someone saved first', { version: 3 }))).toEqual({
      status: 409,
      body: { error: { code: 'version_conflict', message: 'someone saved first' }, current: { version: 3 } },
    });
    expect(toApiError(new DomainError('invalid', 'incomplete', 'not ready', { title: 'required' }))).toEqual({
      status: 422,
      body: { error: { code: 'incomplete', message: 'not ready', fields: { title: 'required' } } },
    });
    expect(toApiError(new HttpError(429, 'rate_limited', 'wait')).status).toBe(429);
  });
});
