/**
 * Every locale has exactly the same keys, every physics error and warning code has a
 * message in every locale, and every key the app asks for with a literal exists.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { LANGUAGES, RESOURCES } from '../../src/i18n/i18n';
import { CASE_CRITERION_IDS, ERROR_CODES, WARNING_CODES } from '../../src/physics';
import { figureKind } from '../../src/i18n/wording';
import { sourceFiles } from '../sourceFiles';
import { HEADER_SCREEN, NAV_SCREENS } from '../../src/app/shell/screens';

function leafKeys(node: unknown, prefix = ''): string[] {
  if (typeof node !== 'object' || node === null) return [prefix];
  return Object.entries(node).flatMap(([k, v]) => leafKeys(v, prefix ? `${prefix}.${k}` : k));
}

function lookup(tree: unknown, key: string): unknown {
  return key
    .split('.')
    .reduce<unknown>(
      (node, part) => (typeof node === 'object' && node !== null ? (node as Record<string, unknown>)[part] : undefined),
      tree,
    );
}

const english = new Set(leafKeys(RESOURCES.en));

describe('locales', () => {
  it.each(LANGUAGES.filter((l) => l !== 'en'))('%s has exactly the keys of en', (lng) => {
    const keys = new Set(leafKeys(RESOURCES[lng]));
    expect(
      [...english].filter((k) => !keys.has(k)),
      'missing',
    ).toEqual([]);
    expect(
      [...keys].filter((k) => !english.has(k)),
      'extra',
    ).toEqual([]);
  });

  it.each(LANGUAGES)('%s has a non-empty message for every physics error and warning code', (lng) => {
    const missing = [...ERROR_CODES.map((c) => `errors.${c}`), ...WARNING_CODES.map((c) => `warnings.${c}`)].filter(
      (key) => {
        const message = lookup(RESOURCES[lng], key);
        return typeof message !== 'string' || message.trim() === '';
      },
    );
    expect(missing).toEqual([]);
  });

  it.each(LANGUAGES)('%s writes no unit after a figure that brings its own (errors and cautions)', (lng) => {
    // "{{value}} mm" would print "10 mm mm": the formatter attaches the unit of depths, temperatures, times, carbon.
    const doubled: string[] = [];
    for (const [top, codes] of [
      ['errors', ERROR_CODES],
      ['warnings', WARNING_CODES],
    ] as const) {
      for (const code of codes) {
        const message = String(lookup(RESOURCES[lng], `${top}.${code}`));
        for (const match of message.matchAll(/\{\{(\w+)\}\}\s*(°C|°F|mm|h\b|%)/gu)) {
          if (figureKind(code, match[1]!) !== 'number') doubled.push(`${top}.${code}: ${match[0]}`);
        }
      }
    }
    expect(doubled).toEqual([]);
  });

  it.each(LANGUAGES)('%s uses the same {{placeholders}} as en in every message', (lng) => {
    const placeholders = (text: unknown) => [...String(text).matchAll(/{{\s*(\w+)/g)].map((m) => m[1]).sort();
    const differing = [...english].filter(
      (key) => placeholders(lookup(RESOURCES.en, key)).join() !== placeholders(lookup(RESOURCES[lng], key)).join(),
    );
    expect(differing).toEqual([]);
  });

  it('every literal key passed to t() in the app exists in en', () => {
    const used = sourceFiles('src/app')
      .concat(sourceFiles('src/pwa'))
      .flatMap((file) => [...readFileSync(file, 'utf8').matchAll(/\bt\(\s*'([^']+)'/g)].map((m) => m[1]!));
    expect(used.length).toBeGreaterThan(50);
    // A key used with a count exists as its plural forms (key_one, key_other).
    const exists = (key: string) => english.has(key) || (english.has(`${key}_one`) && english.has(`${key}_other`));
    expect(used.filter((key) => !exists(key))).toEqual([]);
  });

  it('every key built from a template in the app resolves for each value the code passes', () => {
    // The templates used in the app and the values they take (from the code's own lists).
    const templates: [string, readonly string[]][] = [
      ['app.nav.', [...NAV_SCREENS.map((screen) => screen.id), HEADER_SCREEN.id]],
      ['app.log.tabs.', ['list', 'summary', 'files']],
      ['app.cycleTabs.', ['cycle', 'plan']],
      ['app.plan.steps.', ['boost', 'diffuse', 'hardening']],
      ['app.log.fields.', ['workOrder', 'partNumber', 'furnace', 'operator', 'status', 'notes', 'gradeName']],
      ['app.log.lab.', ['ecd', 'surfaceHardness', 'coreHardness', 'surfaceCarbon', 'by', 'at']],
      ['app.models.', ['agren', 'tibbetts', 'wells-batz-mehl']],
      ['app.calibration.leftOutReason.', ['noInputs', 'noRunConditions', 'invalidInputs', 'noCase']],
      ['app.depth.solveFor.', ['depth', 'time', 'temperature']],
      ['app.depth.carbonSource.', ['potential', 'surface']],
      ['app.settings.system.', ['metric', 'us']],
      ['app.settings.caseCriteria.', CASE_CRITERION_IDS],
      ['app.cycle.coreSource.', ['steel', 'grade', 'default']],
      ['app.settings.quantity.', ['temperature', 'depth', 'time']],
      ['app.settings.themes.', ['dark', 'light', 'contrast']],
      ['app.pwa.status.', ['preparing', 'ready', 'offline']],
      ['app.convert.quantities.', ['temperature', 'length', 'time', 'diffusivity', 'hardness']],
      ['app.cycle.shapes.', ['semi-infinite', 'plate', 'bar']],
      [
        'app.convert.unitNames.',
        [
          'C',
          'F',
          'K',
          'R',
          'mm',
          'um',
          'in',
          'thou',
          'm',
          'h',
          'min',
          's',
          'm2_s',
          'cm2_s',
          'mm2_h',
          'in2_h',
          'HRC',
          'HV',
        ],
      ],
    ];
    const missing = templates
      .flatMap(([prefix, values]) => values.map((v) => prefix + v))
      .filter((key) => !english.has(key));
    expect(missing).toEqual([]);
    const notes = ['atmosphere', 'purge', 'quench', 'estimates'].flatMap((n) => [
      `app.safety.notes.${n}.title`,
      `app.safety.notes.${n}.text`,
    ]);
    expect(notes.filter((key) => !english.has(key))).toEqual([]);
  });
});
