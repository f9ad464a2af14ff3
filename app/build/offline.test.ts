import { describe, it, expect } from 'vitest';
import { mkdtempSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { cacheVersion, offline } from './offline.js';

/** Runs the plugin's bundle hook on a fake bundle and returns the service worker it emits. */
function builtWorker(publicFiles: Record<string, string>, chunks: Record<string, string>, page = '<html></html>') {
  const dir = mkdtempSync(join(tmpdir(), 'mainbrace-offline-'));
  const publicDir = join(dir, 'public');
  mkdirSync(join(publicDir, 'demo'), { recursive: true });
  for (const [name, text] of Object.entries(publicFiles)) writeFileSync(join(publicDir, name), text);
  const template = join(dir, 'index.html');
  writeFileSync(template, page);
  const bundle = Object.fromEntries(
    Object.entries(chunks).map(([fileName, code]) => [fileName, { type: 'chunk', fileName, code }]),
  );
  let source = '';
  const hook = offline(publicDir, template).generateBundle as (o: unknown, b: unknown) => void;
  hook.call({ emitFile: (f: { source: string }) => (source = f.source) }, {}, bundle);
  return { source, version: /const CACHE = 'mainbrace-(\w+)'/.exec(source)![1] };
}

describe('the offline cache version', () => {
  it('changes when a shipped file changes under the same name (a new demo, icon or manifest)', () => {
    const chunks = { 'assets/index-abc.js': 'console.log(1)' };
    const before = builtWorker({ 'demo/larkspur-rise.json': '{"name":"Larkspur Rise"}' }, chunks);
    const after = builtWorker({ 'demo/larkspur-rise.json': '{"name":"Larkspur Rise, phase 2"}' }, chunks);
    const same = builtWorker({ 'demo/larkspur-rise.json': '{"name":"Larkspur Rise"}' }, chunks);
    expect(after.version).not.toBe(before.version);
    expect(same.version).toBe(before.version);
    expect(before.source).toContain('"./demo/larkspur-rise.json"');
  });

  it('changes when the page template or an emitted file changes, and not with the order files come in', () => {
    const a = builtWorker({ 'manifest.webmanifest': '{}' }, { 'assets/index-abc.js': 'one' });
    expect(builtWorker({ 'manifest.webmanifest': '{}' }, { 'assets/index-abc.js': 'two' }).version).not.toBe(a.version);
    expect(
      builtWorker({ 'manifest.webmanifest': '{}' }, { 'assets/index-abc.js': 'one' }, '<html>2</html>').version,
    ).not.toBe(a.version);
    expect(
      cacheVersion([
        ['a', 'x'],
        ['b', 'y'],
      ]),
    ).toBe(
      cacheVersion([
        ['b', 'y'],
        ['a', 'x'],
      ]),
    );
    // Moving bytes from one file to the next is a change, not the same concatenation.
    expect(
      cacheVersion([
        ['a', 'xy'],
        ['b', ''],
      ]),
    ).not.toBe(
      cacheVersion([
        ['a', 'x'],
        ['b', 'y'],
      ]),
    );
  });

  it('precaches afresh past the HTTP cache, and serves this version before a retired one', () => {
    const { source } = builtWorker({}, { 'assets/index-abc.js': 'one' });
    expect(source).toContain("cache: 'reload'");
    expect(source).toMatch(/caches\s*\.open\(CACHE\)\s*\.then\(\(c\) => c\.match\(request/);
    expect(() => new Function(source)).not.toThrow(); // it parses as a script
  });
});
