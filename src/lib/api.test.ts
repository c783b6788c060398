import { describe, expect, it } from 'vitest';
import { apiPath } from './api';

describe('apiPath', () => {
  it('encodes each interpolated value as one segment and keeps the written parts', () => {
    expect(apiPath`/api/assemblies/${'a b/c?d'}/revisions/${3}`).toBe(
      '/api/assemblies/a%20b%2Fc%3Fd/revisions/3',
    );
  });
  it('is the address itself without values', () => {
    expect(apiPath`/api/projects`).toBe('/api/projects');
  });
});
