import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

// Guards the web's cheapest budget (issue: "initial JavaScript under 300 kB gzip for the sign-in
// route") on the build `npm test` makes first; timings are measured by `npm run bench`, not here.
const DIST = join(__dirname, '../../apps/web/dist');
const BUDGET_KB = 300;

interface ManifestChunk {
  file: string;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

/** The files a chunk loads before it runs: itself and its static imports, recursively. */
function staticClosure(manifest: Manifest, key: string, seen = new Set<string>()): Set<string> {
  if (seen.has(key)) return seen;
  seen.add(key);
  for (const imported of manifest[key]?.imports ?? []) staticClosure(manifest, imported, seen);
  return seen;
}

const gzipKb = (file: string) => gzipSync(readFileSync(join(DIST, file))).length / 1024;

describe('web bundle budget', () => {
  const manifest = JSON.parse(readFileSync(join(DIST, '.vite/manifest.json'), 'utf8')) as Manifest;
  const keys = new Set([
    ...staticClosure(manifest, 'index.html'),
    ...staticClosure(manifest, 'src/app/routes/sign-in.tsx'),
  ]);
  const files = [...keys].map((key) => manifest[key]!.file);

  it(`keeps the sign-in route's first JavaScript under ${BUDGET_KB} kB gzip`, () => {
    const total = files.reduce((sum, file) => sum + gzipKb(file), 0);
    expect(files.length).toBeGreaterThan(1);
    expect(total).toBeLessThan(BUDGET_KB);
  });

  it('leaves the data grid and the charts out of the sign-in route', () => {
    expect(files.filter((file) => /data-grid|charts/.test(file))).toEqual([]);
  });
});
