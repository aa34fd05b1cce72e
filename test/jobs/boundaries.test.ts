/**
 * The job log's boundaries, checked on its source: it builds no HTML and evaluates nothing
 * (notes are data), it sends nothing off the device, it depends on physics but never on the
 * app, and papaparse is only loaded when a CSV is made.
 */
import { readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sourceFiles } from '../sourceFiles';

const root = join(__dirname, '..', '..');
const jobsDir = join(root, 'src', 'jobs');

const sources = sourceFiles(jobsDir, /\.ts$/u).map((path) => ({
  path: relative(root, path),
  text: readFileSync(path, 'utf8'),
}));

const offenders = (pattern: RegExp) => sources.filter((s) => pattern.test(s.text)).map((s) => s.path);

describe('job log boundaries (source checks)', () => {
  it('has source files to check', () => {
    expect(sources.length).toBeGreaterThan(10);
  });
  it('builds no HTML and evaluates no text', () => {
    expect(
      offenders(
        /innerHTML|outerHTML|insertAdjacentHTML|document\.write|\beval\s*\(|new Function\s*\(|DOMParser|createContextualFragment/u,
      ),
    ).toEqual([]);
  });
  it('sends nothing off the device', () => {
    expect(
      offenders(/\bfetch\s*\(|XMLHttpRequest|WebSocket|EventSource|sendBeacon|RTCPeerConnection|navigator\.share/u),
    ).toEqual([]);
  });
  it('imports physics, never the app, pwa or UI libraries', () => {
    expect(offenders(/from ['"][./]*app\/|from ['"][./]*pwa\/|from ['"]preact/u)).toEqual([]);
  });
  it('loads papaparse lazily (no static import)', () => {
    expect(offenders(/^import[^;]*from ['"]papaparse['"]/mu)).toEqual([]);
    expect(offenders(/import\(['"]papaparse['"]\)/u)).toEqual(['src/jobs/csv.ts']);
  });
});
