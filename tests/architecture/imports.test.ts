import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/** Import rules of the layout (see DEVELOPERS.md): shared/ is pure; src/ and server/ never import each other; routes do not query the database. */
function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = path.join(dir, name);
    return statSync(p).isDirectory() ? files(p) : /\.(ts|tsx)$/.test(name) ? [p] : [];
  });
}
const importsOf = (file: string) =>
  [...readFileSync(file, 'utf8').matchAll(/^\s*(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]/gm)].map(
    (m) => m[1]!,
  );

const SHARED_ALLOWED = /^(zod|mathjs|convert-units|@shared\/|@data\/reference\/|\.{1,2}\/)/;

describe('import rules', () => {
  it('shared/ imports only shared/, zod, small pure libraries and data/reference', () => {
    const offenders = files('shared')
      .filter((f) => !/\.test\.ts$/.test(f))
      .flatMap((f) =>
        importsOf(f)
          .filter((i) => !SHARED_ALLOWED.test(i) || i.includes('/server/') || i.includes('/src/'))
          .map((i) => `${f}: ${i}`),
      );
    expect(offenders).toEqual([]);
  });
  it('src/ never imports server/ and server/ never imports src/', () => {
    const clientToServer = files('src').flatMap((f) =>
      importsOf(f)
        .filter((i) => /(^|\/)server\//.test(i))
        .map((i) => `${f}: ${i}`),
    );
    const serverToClient = files('server').flatMap((f) =>
      importsOf(f)
        .filter((i) => /(^|\.\.\/)src\//.test(i))
        .map((i) => `${f}: ${i}`),
    );
    expect([...clientToServer, ...serverToClient]).toEqual([]);
  });
  it('routes reach the database only through services', () => {
    const offenders = files('server/routes').flatMap((f) =>
      importsOf(f)
        .filter((i) => /db\/|drizzle-orm/.test(i))
        .map((i) => `${f}: ${i}`),
    );
    expect(offenders).toEqual([]);
  });
});
