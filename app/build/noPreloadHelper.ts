import type { Plugin } from 'vite';

const HELPER = 'var __vitePreload = function preload(';

/**
 * Vite wraps every dynamic import in a helper that preloads the part's CSS and imports; with module
 * preload off and every style in the one first-load stylesheet, each call passes no dependencies and
 * the helper only calls the import (an open Vite issue, #13952). This puts a plain call in its place,
 * so that its 0.7 kB gzipped leaves the first load (docs/performance.md), and stops the build if a lazy
 * part ever brings a stylesheet of its own, which the helper would have had to load.
 */
export function noPreloadHelper(): Plugin {
  return {
    name: 'mainbrace:no-preload-helper',
    apply: 'build',
    renderChunk: {
      order: 'post',
      handler(code, chunk) {
        if (!code.includes(HELPER)) {
          // A Vite that writes the helper otherwise would bring it back unnoticed: say so.
          if (chunk.isEntry && code.includes('__vitePreload('))
            this.warn('the preload helper was not found where expected: it stays in the first load');
          return null;
        }
        // The original stays, unused, for the minifier to drop with the pieces only it used.
        return {
          code: code.replace(HELPER, 'var __vitePreload = (load) => load();\nvar unusedPreload = function preload('),
          map: null,
        };
      },
    },
    generateBundle(_options, bundle) {
      for (const chunk of Object.values(bundle)) {
        if (chunk.type !== 'chunk' || chunk.isEntry) continue;
        const css = chunk.viteMetadata?.importedCss;
        if (css && css.size > 0)
          this.error(
            `${chunk.fileName} imports a stylesheet (${[...css].join(', ')}): the preload helper cannot be dropped`,
          );
      }
    },
  };
}
