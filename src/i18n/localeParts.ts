/**
 * Each locale file is loaded in two parts: the keys the first screen (case depth, the shell
 * around it) needs before it can paint, and the rest, which follows right after. The split is
 * made at build time from the one file per language (src/i18n/build/localeChunks.ts); this
 * module is the pure rule both the build and the tests use.
 */

/** A locale file: nested objects whose leaves are messages. */
export interface Messages {
  [key: string]: string | Messages;
}

export const LOCALE_PARTS = ['first', 'rest'] as const;
export type LocalePart = (typeof LOCALE_PARTS)[number];

/**
 * Key paths of the first part. A path names a message or a whole subtree; a message's plural
 * forms (`key_one`, `key_other`, …) come with it; a path written `!path` is left to the rest even
 * inside a subtree named here. test/i18n/localeParts.test.ts checks that every
 * key the first screen's code can ask for is here, and that every entry is still asked for.
 */
export const FIRST_SCREEN_KEYS: readonly string[] = [
  'app.name',
  'app.nav',
  'app.shell',
  'app.pwa',
  'app.common',
  'app.fields',
  'app.steel',
  'app.models',
  'app.depth',
  'app.cycle.stepCaution',
  'app.band.label',
  'app.band.models',
  'app.band.temperature',
  'app.band.beta',
  'app.band.likely',
  'app.band.methodTitle',
  'app.band.method',
  'app.band.methodBeta',
  'app.band.methodNote',
  'app.calibration.label',
  'app.calibration.short',
  'app.calibration.applied',
  'app.calibration.off',
  'app.calibration.otherModel',
  'app.calibration.notFitted',
  'app.calibration.noFurnace',
  'app.calibration.furnace',
  'app.calibration.chooseHint',
  // The calculators' buttons only; their forms load with the rest.
  'app.log.save.button',
  'app.log.save.openJob',
  'app.log.note.button',
  // Any physics error or caution can reach the first screen's fields, but those of the planner and
  // the lab's readers (which the first screen never loads; the test checks none of their codes
  // is written there).
  'errors',
  'warnings',
  '!errors.plantThreshold',
  '!errors.traverse',
  '!warnings.plan',
  '!warnings.traverse',
];

/** i18next's plural (and ordinal plural) suffixes. */
const PLURAL_SUFFIX = /^(?:_ordinal)?_(?:zero|one|two|few|many|other)$/u;

/** Whether the message at `path` belongs to the first part named by `keys`. */
export function isFirstScreenKey(path: string, keys: readonly string[] = FIRST_SCREEN_KEYS): boolean {
  const names = (key: string) =>
    path === key ||
    path.startsWith(`${key}.`) ||
    (path.startsWith(`${key}_`) && PLURAL_SUFFIX.test(path.slice(key.length)));
  const left = keys.filter((key) => key.startsWith('!')).map((key) => key.slice(1));
  return keys.some((key) => !key.startsWith('!') && names(key)) && !left.some(names);
}

const isTree = (value: unknown): value is Messages =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * The messages of one part, in the file's order, with the file's nesting; subtrees left
 * empty are dropped. The two parts of a file are disjoint and together are the whole file.
 */
export function pickLocalePart(
  messages: Messages,
  part: LocalePart,
  keys: readonly string[] = FIRST_SCREEN_KEYS,
): Messages {
  const wanted = part === 'first';
  const pick = (tree: Messages, prefix: string): Messages | undefined => {
    const out: Messages = {};
    for (const [name, value] of Object.entries(tree)) {
      const path = prefix ? `${prefix}.${name}` : name;
      if (isTree(value) && Object.keys(value).length > 0) {
        const inner = pick(value, path);
        if (inner) out[name] = inner;
      } else if (isFirstScreenKey(path, keys) === wanted) {
        out[name] = value;
      }
    }
    return Object.keys(out).length > 0 ? out : undefined;
  };
  return pick(messages, '') ?? {};
}
