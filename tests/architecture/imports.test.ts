import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * Import rules of the layout (see DEVELOPERS.md): shared/ is pure; src/ and server/ never import each other;
 * routes do not query the database; services, storage and auth never import the HTTP layer.
 */
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

/** The feature (src/features/<name>) a client file belongs to, or the layer it is in (components, lib, app). */
function clientPart(file: string): string {
  const parts = file.split(path.sep);
  return parts[1] === 'features' ? `features/${parts[2]}` : (parts[1] ?? '');
}
/** The client files a file imports by a relative path (the client imports its own files only that way). */
const clientImportsOf = (file: string) =>
  importsOf(file)
    .filter((i) => i.startsWith('.'))
    .map((i) => path.normalize(path.join(path.dirname(file), i)));

/**
 * Features that may use another feature, and why. Any other feature-to-feature import fails: a feature is
 * changed without reading the others.
 */
const FEATURE_USES: Record<string, string[]> = {
  // A submittal lists check runs and links their compliance sheets, and lists inspections to add a field report.
  'features/submittals': ['features/checks', 'features/sheets', 'features/inspections'],
  // Each stored run on the checks page opens and downloads its compliance sheet; with no code table yet, the
  // page starts one (the code-table create call and row kinds) in a firm the person may write for (their firms).
  'features/checks': ['features/sheets', 'features/criteria', 'features/me'],
  // The joints & quantities sheet edits the joint schedule and the elevation takeoff together, saved as one
  // revision of the assembly.
  'features/joints': ['features/takeoff'],
  // A sweep reads its code table's rows, and makes a chosen variant an assembly or a revision of this one (the
  // assemblies' create and save calls and their number boxes); it prices from the firm library by the person's
  // firm role (me), and prints a saved sweep on a check run's compliance sheet (the runs and the sheet's address).
  'features/sweep': [
    'features/assemblies',
    'features/criteria',
    'features/me',
    'features/checks',
    'features/sheets',
  ],
  // A field report's code is confirmed on the same public page as a sheet's, in the same issuer frame.
  // A deficiency's owner is picked from the project's members.
  'features/inspections': ['features/sheets', 'features/members'],
};

const SHARED_ALLOWED = /^(zod|mathjs|convert-units|papaparse|@shared\/|@data\/reference\/|\.{1,2}\/)/;

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
  it('services, storage and auth import nothing from server/http or server/routes (they throw DomainError)', () => {
    const offenders = ['server/services', 'server/storage', 'server/auth'].flatMap(files).flatMap((f) =>
      importsOf(f)
        .filter((i) => /(^|\/)(http|routes)(\/|$)/.test(i))
        .map((i) => `${f}: ${i}`),
    );
    expect(offenders).toEqual([]);
  });
  it('a feature imports another feature only as FEATURE_USES states; components/ and lib/ import no feature', () => {
    const offenders = files('src')
      .filter((f) => !/\.test\.tsx?$/.test(f))
      .flatMap((f) => {
        const from = clientPart(f);
        return clientImportsOf(f)
          .map(clientPart)
          .filter((to) => to.startsWith('features/') && to !== from)
          .filter((to) =>
            from.startsWith('features/')
              ? !FEATURE_USES[from]?.includes(to)
              : ['components', 'lib'].includes(from),
          )
          .map((to) => `${f} → ${to}`);
      });
    expect(offenders).toEqual([]);
  });
});
