/**
 * Physics errors and cautions in words, for the app and the CLI alike. Every figure of a message
 * goes through the one formatter with its quantity's unit and precision, so no raw float, no
 * point-decimal in a German sentence and no unit missing from a figure: the messages in the
 * locales hold no units next to their placeholders, the formatted figure brings its own.
 */
import type { TFunction } from 'i18next';
import {
  convert,
  convertTemperatureDifference,
  type ErrorCode,
  type InputError,
  type Params,
  type Warning,
  type WarningCode,
} from '../physics';
import { formatMessageNumber, formatMessageQuantity, NO_VALUE, unitSymbol } from './format';

/** What a figure in a message is; it decides the unit it is shown in and its precision. */
export type FigureKind = 'depth' | 'temperature' | 'temperatureChange' | 'time' | 'carbon' | 'alloy' | 'number';

/** The units figures are shown in (the user's, or physics' own for the CLI). */
export interface MessageUnits {
  temperature: 'C' | 'F';
  depth: 'mm' | 'in';
  time: 'h' | 'min';
}

/** The units physics works in: the CLI words its messages in them. */
export const PHYSICS_MESSAGE_UNITS: MessageUnits = { temperature: 'C', depth: 'mm', time: 'h' };

/** Formats one figure of a message by its kind (physics units in: °C, mm, h, %C). */
export type Figures = (kind: FigureKind, value: number) => string;

export function messageFigures(units: MessageUnits, locale: string): Figures {
  const quantity = (value: number, from: string, to: string) => {
    const converted = convert(value, from, to);
    return converted.ok ? formatMessageQuantity(converted.value, to, locale) : NO_VALUE;
  };
  return (kind, value) => {
    switch (kind) {
      case 'depth':
        return quantity(value, 'mm', units.depth);
      case 'temperature':
        return quantity(value, 'C', units.temperature);
      case 'temperatureChange':
        return formatMessageQuantity(
          convertTemperatureDifference(value, 'C', units.temperature),
          units.temperature,
          locale,
        );
      case 'time':
        return quantity(value, 'h', units.time);
      case 'carbon':
        return formatMessageQuantity(value, 'pctC', locale);
      case 'alloy':
        return formatMessageQuantity(value, 'pct', locale);
      case 'number':
        return formatMessageNumber(value, locale);
    }
  };
}

/** Params named for no unit (`value`, `min`, …) take the kind their message is about. */
const UNNAMED = new Set(['value', 'min', 'max', 'previous']);

/** The kind of the unnamed params of a code, where neither their name nor the field says it. */
const CODE_KINDS: Partial<Record<ErrorCode | WarningCode, FigureKind>> = {
  'time.notPositive': 'time',
  'time.tooLong': 'time',
  'time.limitTooShort': 'time',
  'temperature.outOfRange': 'temperature',
  'temperature.noAustenite': 'temperature',
  'carbon.negative': 'carbon',
  'carbon.aboveMax': 'carbon',
  'depth.notPositive': 'depth',
  'depth.tooDeep': 'depth',
  'composition.outOfRange': 'alloy',
  'totalCaseMargin.outOfRange': 'carbon',
  'temperatureTolerance.outOfRange': 'temperatureChange',
  'shape.sizeOutOfRange': 'depth',
  'history.notIncreasing': 'time',
  'history.temperatureTooHigh': 'temperature',
  'traverse.depthNegative': 'depth',
  'traverse.depthRepeated': 'depth',
  'traverse.depthNotIncreasing': 'depth',
  // Typed in its own unit, named by a `unit` param: a plain figure.
  'temperature.belowAbsoluteZero': 'number',
  'hardness.outOfTable': 'number',
  'hardness.outsideScale': 'number',
  'hardness.outsideScaleOtherUnit': 'number',
  'diffusivityFactor.outOfRange': 'number',
  'calibration.factorOutOfRange': 'number',
  'calibration.tooFewJobs': 'number',
  'history.tooShort': 'number',
  'steps.tooMany': 'number',
  'traverse.tooFewPoints': 'number',
  'traverse.tooManyPoints': 'number',
};

/** The kind a name's unit suffix says (`depthMm`, `limitPct`, `tempC`, `totalH`, `deltaC`). */
function kindOfName(name: string): FigureKind | undefined {
  if (name === 'deltaC') return 'temperatureChange';
  if (name.endsWith('Mm')) return 'depth';
  if (name.endsWith('Pct')) return 'carbon';
  if (/[a-z0-9]C$/u.test(name)) return 'temperature';
  if (/[a-z]H$/u.test(name)) return 'time';
  return undefined;
}

/** The kind of a request field (`steps.2.timeH`, `targetEcdMm`): its deepest part that names a unit. */
function kindOfField(field: string | undefined): FigureKind | undefined {
  if (field === undefined) return undefined;
  for (const part of field.split('.').reverse()) {
    const kind = kindOfName(part);
    if (kind) return kind;
  }
  return undefined;
}

export function figureKind(code: ErrorCode | WarningCode, name: string, field?: string): FigureKind {
  if (UNNAMED.has(name)) return CODE_KINDS[code] ?? kindOfField(field) ?? 'number';
  return kindOfName(name) ?? 'number';
}

/** Text params that hold a unit code ("C", "HV"): shown as its symbol. */
const UNIT_PARAMS = new Set(['unit', 'otherUnit', 'limitUnit', 'from', 'to']);

/**
 * Every param ready for the message: figures formatted by kind, unit codes as symbols. `count`
 * stays a number, since i18next picks the plural form from it (counts are whole numbers).
 */
export function wordParams(
  code: ErrorCode | WarningCode,
  params: Params | undefined,
  figures: Figures,
  field?: string,
): Record<string, string | number> {
  const out: Record<string, string | number> = {};
  for (const [name, raw] of Object.entries(params ?? {})) {
    if (typeof raw === 'number') {
      out[name] = name === 'count' && Number.isInteger(raw) ? raw : figures(figureKind(code, name, field), raw);
    } else {
      out[name] = UNIT_PARAMS.has(name) ? unitSymbol(raw) : raw;
    }
  }
  return out;
}

/** The sentence for a physics error. */
export function wordError(t: TFunction, error: InputError, figures: Figures): string {
  return t(`errors.${error.code}`, wordParams(error.code, error.params, figures, error.field));
}

/** The sentence for a physics caution or planner finding. */
export function wordWarning(t: TFunction, warning: Warning, figures: Figures): string {
  return t(`warnings.${warning.code}`, wordParams(warning.code, warning.params, figures));
}
