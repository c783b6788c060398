// `npm run size`: the JavaScript a browser downloads before the first page shows (the entry chunk and every
// chunk it imports statically), gzip-compressed, read from the build manifest of `vite build`.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

/** Initial JavaScript budget, gzip kB. */
export const INITIAL_JS_BUDGET_KB = 200;

interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
}

const clientDir = fileURLToPath(new URL('../../dist/client', import.meta.url));

/** The initial chunks and their gzip size (bytes), or null when the client has not been built. */
export function measureInitialJs(
  dir = clientDir,
): { files: { file: string; gzip: number }[]; total: number } | null {
  const manifestPath = path.join(dir, '.vite', 'manifest.json');
  if (!existsSync(manifestPath)) return null;
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as Record<string, ManifestChunk>;
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    for (const k of manifest[key]?.imports ?? []) visit(k);
  };
  for (const [key, chunk] of Object.entries(manifest)) if (chunk.isEntry) visit(key);
  const files = [...seen]
    .map((k) => manifest[k]!.file)
    .filter((f) => f.endsWith('.js'))
    .map((file) => ({ file, gzip: gzipSync(readFileSync(path.join(dir, file)), { level: 9 }).length }));
  return { files, total: files.reduce((s, f) => s + f.gzip, 0) };
}

/** One line for the benchmark print-out. */
export function initialJsLine(): string {
  const m = measureInitialJs();
  if (!m) return 'initial JavaScript: no build found (npm run build)';
  const kb = m.total / 1024;
  const verdict =
    kb <= INITIAL_JS_BUDGET_KB
      ? `meets budget ≤ ${INITIAL_JS_BUDGET_KB} kB`
      : `OVER budget ${INITIAL_JS_BUDGET_KB} kB`;
  return `${'initial JavaScript (gzip)'.padEnd(48)} ${kb.toFixed(1).padStart(8)} kB in ${m.files.length} chunk(s)   ${verdict}`;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  const m = measureInitialJs();
  if (!m) {
    console.error('No build manifest in dist/client — run `npm run build` first.');
    process.exit(1);
  }
  for (const f of m.files) console.log(`${(f.gzip / 1024).toFixed(1).padStart(8)} kB  ${f.file}`);
  console.log(initialJsLine());
  if (m.total / 1024 > INITIAL_JS_BUDGET_KB) process.exitCode = 1;
}
