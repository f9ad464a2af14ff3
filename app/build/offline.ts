import { createHash } from 'node:crypto';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import type { Plugin } from 'vite';
import { serviceWorker } from './serviceWorker.js';

/**
 * Only the app's own resources: no inline script, no other origin. Set as a meta tag in built pages
 * (the dev server needs inline scripts for hot reload, so it is left out there).
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self'",
  "manifest-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? filesUnder(path) : [path];
  });
}

/**
 * The cache version: a hash of every shipped file's name and contents, so a changed demo, icon or
 * manifest under the same name installs a new cache instead of being served stale.
 */
export function cacheVersion(files: readonly (readonly [name: string, content: string | Uint8Array])[]): string {
  const hash = createHash('sha256');
  for (const [name, content] of [...files].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) {
    hash.update(`${name}\0${typeof content === 'string' ? Buffer.byteLength(content) : content.length}\0`);
    hash.update(content);
  }
  return hash.digest('hex').slice(0, 12);
}

/** Build plugin: the CSP meta tag, and a service worker listing every emitted and public file. */
export function offline(publicDir: string, htmlTemplate: string): Plugin {
  return {
    name: 'mainbrace-offline',
    apply: 'build',
    transformIndexHtml(html) {
      return html.replace(
        '<meta charset="UTF-8" />',
        `<meta charset="UTF-8" />\n    <meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}" />`,
      );
    },
    generateBundle(_options, bundle) {
      const emitted = Object.values(bundle)
        .filter((f) => f.fileName !== 'sw.js')
        .map((f) => [f.fileName, f.type === 'chunk' ? f.code : f.source] as const);
      const shipped = filesUnder(publicDir).map(
        (f) => [relative(publicDir, f).split('\\').join('/'), readFileSync(f)] as const,
      );
      // The page itself is emitted after this hook: its template and the policy stand for it.
      const page = ['./', readFileSync(htmlTemplate, 'utf8') + CONTENT_SECURITY_POLICY] as const;
      const all = [...emitted, ...shipped];
      const files = ['./', ...all.map(([name]) => `./${name}`)];
      this.emitFile({
        type: 'asset',
        fileName: 'sw.js',
        source: serviceWorker(cacheVersion([...all, page]), files),
      });
    },
  };
}
