// Reports the JavaScript a first visit downloads for a route (gzip), from the Vite manifest of
// the last build: the entry with its static imports, plus the route's lazy module with its own;
// then what that code loads only when used (a form's checks, a dialog), reported beside it.
// A benchmark to read, not a test: it asserts nothing. Run `npm run build -w frontend` first.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

const dist = join(import.meta.dirname, '..', 'dist');
const manifest = JSON.parse(readFileSync(join(dist, '.vite', 'manifest.json'), 'utf8'));

function collect(key, files = new Set()) {
  const chunk = manifest[key];
  if (!chunk || files.has(chunk.file)) return files;
  files.add(chunk.file);
  for (const imported of chunk.imports ?? []) collect(imported, files);
  return files;
}

const gzipKb = (files) =>
  [...files].reduce((sum, file) => sum + gzipSync(readFileSync(join(dist, file)), { level: 9 }).length, 0) / 1024;

const routes = {
  'sign-in': 'src/app/routes/auth/sign-in.tsx',
  'student drill page': 'src/app/routes/student/drill.tsx',
  'student result': 'src/app/routes/attempt.tsx',
  'drill editor': 'src/app/routes/teacher/drill-editor.tsx',
};
/** What a route's own chunks import lazily (a form's checks, a chart), other routes left out. */
function onUse(files) {
  const later = new Set();
  const keys = Object.keys(manifest).filter((key) => files.has(manifest[key].file) && key !== 'index.html');
  for (const key of keys) {
    for (const lazy of manifest[key].dynamicImports ?? []) {
      if (!lazy.startsWith('src/app/routes/')) collect(lazy, later);
    }
  }
  for (const file of files) later.delete(file);
  return later;
}

const entry = collect('index.html');
console.log(`entry alone: ${gzipKb(entry).toFixed(1)} KB gzip (${entry.size} files)`);
for (const [name, key] of Object.entries(routes)) {
  const files = collect(key, new Set(entry));
  const later = onUse(files);
  console.log(
    `${name}: ${gzipKb(files).toFixed(1)} KB gzip (${files.size} files)` +
      (later.size ? `; + ${gzipKb(later).toFixed(1)} KB loaded on first use (${later.size} files)` : ''),
  );
}
