import { describe, expect, it } from 'vitest';
import { createI18n, LANGUAGES, RESOURCES } from '../../src/i18n/i18n';
import { JOB_INPUT_KINDS } from '../../src/jobs/inputs';
import { HINTED_FIELDS, JOBS_ERROR_CODES, PROBLEM_CODES } from '../../src/jobs/result';
import { JOB_STATUSES } from '../../src/jobs/schema';
import { SHIFT_IDS } from '../../src/jobs/shift';

function keyPaths(value: unknown, prefix = ''): string[] {
  if (typeof value !== 'object' || value === null) return [prefix];
  return Object.entries(value).flatMap(([k, v]) => keyPaths(v, prefix ? `${prefix}.${k}` : k));
}

describe('jobs section of the locales', () => {
  it('has identical keys in en, es and de', () => {
    const en = keyPaths(RESOURCES.en.jobs).sort();
    expect(en.length).toBeGreaterThan(40);
    for (const language of LANGUAGES) expect(keyPaths(RESOURCES[language].jobs).sort()).toEqual(en);
  });

  const keys = [
    ...JOBS_ERROR_CODES.map((c) => `jobs.errors.${c}`),
    ...PROBLEM_CODES.map((c) => `jobs.problems.${c}`),
    ...JOB_STATUSES.map((s) => `jobs.status.${s}`),
    ...SHIFT_IDS.map((s) => `jobs.shift.${s}`),
    ...JOB_INPUT_KINDS.map((k) => `jobs.inputKind.${k}`),
    ...HINTED_FIELDS.map((f) => `jobs.hints.${f}`),
    ...['granted', 'denied', 'unsupported'].map((p) => `jobs.persist.${p}`),
    'jobs.importReport',
    'jobs.exportSkipped',
    'jobs.corruptRecord',
  ];
  const params = {
    count: 2,
    id: 'x',
    name: 'UnknownError',
    version: 3,
    supported: 2,
    path: 'jobs[0].notes',
    expected: '<=4000',
    added: 1,
    updated: 2,
    unchanged: 3,
    conflicts: 4,
    clamped: 5,
  };

  it.each(LANGUAGES)('every code, status, shift and notice has a full sentence in %s', (language) => {
    const i18n = createI18n(language);
    for (const key of keys) {
      const text = i18n.t(key, params);
      expect(text, key).not.toBe(key);
      expect(text, key).not.toMatch(/\{\{|\}\}/u);
      expect(i18n.exists(key, { ...params, lng: language, fallbackLng: [] }), `${key} in ${language}`).toBe(true);
    }
  });
});
