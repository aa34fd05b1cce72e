/**
 * The register of approximate constants in words: for each, its name, the value the engine uses
 * (in the user's units), whether it is recalled from memory or common practice, and how much a
 * result depends on it. Pure: the safety screen renders it.
 */
import type { TFunction } from 'i18next';
import {
  APPROXIMATIONS,
  type Approximation,
  type ApproximationEffect,
  type ApproximationUnit,
  type ApproximationValue,
} from '../../physics';
import { UNIT_SYMBOLS } from '../ui/format';
import type { Show } from '../ui/show';

export interface ApproximationRow {
  id: string;
  name: string;
  value: string;
  basis: string;
  effect: string;
}

/** β is shown in the unit it is typed in (10⁻⁷ m/s). */
const BETA_SHOWN = 1e-7;

function quantity(show: Show, value: number, unit: ApproximationUnit): string {
  if (unit === 'C') return show.temperature(value);
  if (unit === 'deltaC') return `±${show.temperatureDifference(value)}`;
  if (unit === 'pctC') return show.carbon(value);
  if (unit === 'mPerS') return `${show.number(value / BETA_SHOWN, 1)} ${UNIT_SYMBOLS.beta7}`;
  if (unit === 'HRC') return show.hardnessHrc(value);
  return show.number(value, 2);
}

/** Decimals a coefficient is written with (at most 3): 0.055, −15.2, −203. */
const decimalsOf = (value: number) => [0, 1, 2].find((d) => Number(value.toFixed(d)) === value) ?? 3;

function valueText(t: TFunction, show: Show, id: string, value: ApproximationValue): string {
  switch (value.kind) {
    case 'number':
      return quantity(show, value.value, value.unit);
    case 'range':
      return `${quantity(show, value.min, value.unit)} – ${quantity(show, value.max, value.unit)}`;
    case 'coefficients': {
      // One number of decimals for all the terms, so they line up: 0.055, −0.040.
      const digits = Math.max(...Object.values(value.terms).map(decimalsOf));
      return Object.entries(value.terms)
        .map(([term, coefficient]) => `${term} ${show.number(coefficient, digits)}`)
        .join(' · ');
    }
    case 'formula':
      return t(`app.approximations.items.${id}.formula`);
  }
}

const signedPct = (show: Show, pct: number) => `${pct > 0 ? '+' : ''}${show.number(pct, 1)} %`;

function effectText(t: TFunction, show: Show, effect: ApproximationEffect): string {
  if (effect.kind !== 'result') return t(`app.approximations.effect.${effect.kind}`);
  const reference = t(`app.approximations.references.${effect.reference}`, {
    temperature: show.temperature(930),
    from: show.temperature(890),
    to: show.temperature(925),
  });
  return t('app.approximations.effect.result', {
    result: t(`app.approximations.results.${effect.result}`),
    minus: signedPct(show, effect.minusPct),
    plus: signedPct(show, effect.plusPct),
    reference,
  });
}

export function approximationRows(t: TFunction, show: Show): ApproximationRow[] {
  return APPROXIMATIONS.map((a: Approximation) => ({
    id: a.id,
    name: t(`app.approximations.items.${a.id}.name`),
    value: valueText(t, show, a.id, a.value),
    basis: t(`app.approximations.basis.${a.basis}`),
    effect: effectText(t, show, a.effect),
  }));
}
