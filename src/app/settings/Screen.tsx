/** Settings: units (system and per-quantity overrides), language, model, defaults, shift hours, theme. */
import { LANGUAGES, type Language } from '../../i18n/i18n';
import { parseShiftConfig, SHIFT_IDS } from '../../jobs/shift';
import { language } from '../../i18n/useT';
import { CASE_CRITERION_IDS, MODEL_IDS } from '../../physics';
import { ChoiceField } from '../ui/ChoiceField';
import { modelSpreadHint, wellsBatzMehlNote } from '../fields/modelNotes';
import { speedParams } from '../fields/calibrationWords';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { patch } from '../ui/persist';
import { ShopServerCard } from '../sync/ShopServerCard';
import { Segmented } from '../ui/Segmented';
import { TextField } from '../ui/TextField';
import { Deferred } from '../ui/Deferred';
import { useScreenContext } from './screenContext';
import { temperatureDifferenceText } from '../ui/fieldText';
import { UNIT_CHOICES, UNIT_SYSTEMS, type DisplayQuantity, type UnitSystem } from '../ui/units';
import { hrefFor } from '../shell/route';
import { calibrations } from './calibration';
import {
  caseCriterion,
  readBeta,
  readBetaRange,
  readMargin,
  readThreshold,
  readTolerance,
  setLanguage,
  settings,
  THEMES,
} from './state';
import './screen.css';

/** Each language names itself, so it can be found whatever the current language. */
const LANGUAGE_NAMES: Record<Language, string> = { en: 'English', es: 'Español', de: 'Deutsch' };

export default function SettingsScreen() {
  const { t, word, units, locale, show } = useScreenContext();
  const s = settings.value;
  const tolerance = readTolerance(s.temperatureTolerance);
  const betaRange = readBetaRange(s.betaRangeMin, s.betaRangeMax);
  const betaRangeError = (field: string) =>
    !betaRange.ok && betaRange.error.field === field ? word(betaRange.error) : undefined;
  const beta = readBeta(s.beta);
  const threshold = readThreshold(s.ecdThreshold);
  const margin = readMargin(s.totalCaseMargin);
  const marginError = margin.ok ? undefined : word(margin.error);
  const unitChoices = (q: DisplayQuantity) => [
    { value: 'auto', label: t('app.settings.followSystem') },
    ...UNIT_CHOICES[q].map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u })),
  ];
  const shiftsValid = parseShiftConfig(s.shiftStarts).ok;
  const setOverride = (q: DisplayQuantity, value: string) =>
    patch(settings, { overrides: { ...s.overrides, [q]: value } });

  return (
    <div class="screen settings">
      <h1 tabIndex={-1}>{t('app.settings.title')}</h1>
      <section class="card" aria-labelledby="settings-language">
        <h2 id="settings-language">{t('app.settings.languageHeading')}</h2>
        <Segmented
          name="settings-language"
          legend={t('app.settings.language')}
          value={language.value}
          choices={LANGUAGES.map((l) => ({ value: l, label: LANGUAGE_NAMES[l] }))}
          onChange={(v) => void setLanguage(v as Language)}
        />
      </section>
      <section class="card" aria-labelledby="settings-units">
        <h2 id="settings-units">{t('app.settings.unitsHeading')}</h2>
        <Segmented
          name="settings-units"
          legend={t('app.settings.unitSystem')}
          value={s.unitSystem}
          choices={UNIT_SYSTEMS.map((u) => ({ value: u, label: t(`app.settings.system.${u}`) }))}
          onChange={(v) => patch(settings, { unitSystem: v as UnitSystem })}
        />
        {(Object.keys(UNIT_CHOICES) as DisplayQuantity[]).map((q) => (
          <Segmented
            key={q}
            name={`settings-unit-${q}`}
            legend={t(`app.settings.quantity.${q}`)}
            value={s.overrides[q]}
            choices={unitChoices(q)}
            onChange={(v) => setOverride(q, v)}
          />
        ))}
        <p class="note">{t('app.settings.overrideHint')}</p>
      </section>
      <section class="card" aria-labelledby="settings-theme">
        <h2 id="settings-theme">{t('app.settings.themeHeading')}</h2>
        <Segmented
          name="settings-theme"
          legend={t('app.settings.theme')}
          value={s.theme}
          choices={THEMES.map((th) => ({ value: th, label: t(`app.settings.themes.${th}`) }))}
          onChange={(v) => patch(settings, { theme: v })}
        />
      </section>
      {/* Lower sections in later tasks, so opening the screen is several short tasks. */}
      <Deferred>
        <section class="card" aria-labelledby="settings-model">
          <h2 id="settings-model">{t('app.settings.calculationHeading')}</h2>
          <ChoiceField
            id="settings-model-choice"
            label={t('app.settings.model')}
            value={s.model}
            choices={MODEL_IDS.map((m) => ({ value: m, label: t(`app.models.${m}`) }))}
            onChange={(v) => patch(settings, { model: v })}
            hint={modelSpreadHint(t, show)}
          />
          {s.model === 'wells-batz-mehl' && <p class="note">{wellsBatzMehlNote(t, show)}</p>}
          <Segmented
            name="settings-case-criterion"
            legend={t('app.settings.caseCriterion')}
            value={caseCriterion.value}
            choices={CASE_CRITERION_IDS.map((c) => ({ value: c, label: t(`app.settings.caseCriteria.${c}`) }))}
            onChange={(v) => patch(settings, { caseCriterion: v })}
          />
          <p class="note">{t('app.settings.caseCriterionHint')}</p>
          <div class="field-grid">
            <NumberField
              id="settings-threshold"
              label={t('app.settings.ecdThreshold')}
              unitLabel={UNIT_SYMBOLS.pctC}
              value={s.ecdThreshold}
              onInput={(v) => patch(settings, { ecdThreshold: v })}
              error={threshold.ok ? undefined : word(threshold.error)}
              hint={t('app.settings.ecdThresholdHint')}
            />
            <NumberField
              id="settings-margin"
              label={t('app.settings.totalCaseMargin')}
              unitLabel={UNIT_SYMBOLS.pctC}
              value={s.totalCaseMargin}
              onInput={(v) => patch(settings, { totalCaseMargin: v })}
              error={marginError}
              hint={t('app.settings.totalCaseMarginHint')}
            />
            <NumberField
              id="settings-beta"
              label={t('app.settings.beta')}
              unitLabel={UNIT_SYMBOLS.beta7}
              value={s.beta}
              onInput={(v) => patch(settings, { beta: v })}
              error={beta.ok ? undefined : word(beta.error)}
              hint={t('app.settings.betaHint')}
            />
          </div>
        </section>
      </Deferred>
      <Deferred>
        <section class="card" aria-labelledby="settings-range">
          <h2 id="settings-range">{t('app.settings.rangeHeading')}</h2>
          <NumberField
            id="settings-tolerance"
            label={t('app.settings.tolerance')}
            unitLabel={`±${UNIT_SYMBOLS[units.temperature]}`}
            value={{ text: temperatureDifferenceText(s.temperatureTolerance, units.temperature, locale), unit: '' }}
            onInput={(v) => patch(settings, { temperatureTolerance: { text: v.text, unit: units.temperature } })}
            error={tolerance.ok ? undefined : word(tolerance.error)}
            hint={t('app.settings.toleranceHint')}
          />
          <NumberField
            id="settings-beta-min"
            label={t('app.settings.betaRangeMin')}
            unitLabel={UNIT_SYMBOLS.beta7}
            value={s.betaRangeMin}
            onInput={(v) => patch(settings, { betaRangeMin: v })}
            error={betaRangeError('betaRangeMin')}
          />
          <NumberField
            id="settings-beta-max"
            label={t('app.settings.betaRangeMax')}
            unitLabel={UNIT_SYMBOLS.beta7}
            value={s.betaRangeMax}
            onInput={(v) => patch(settings, { betaRangeMax: v })}
            error={betaRangeError('betaRangeMax')}
          />
          <p class="note">{t('app.settings.betaRangeHint')}</p>
        </section>
      </Deferred>
      <Deferred>
        <section class="card" aria-labelledby="settings-calibration">
          <h2 id="settings-calibration">{t('app.settings.calibrationHeading')}</h2>
          {calibrations.value.length === 0 ? (
            <p class="note">{t('app.settings.calibrationNone')}</p>
          ) : (
            <ul class="settings-calibrations">
              {calibrations.value.map((c) => (
                <li key={c.furnace}>
                  {t('app.calibration.furnaceHeading', { furnace: c.furnace })}:{' '}
                  {t('app.calibration.factorValue', speedParams(show, c.factor))} ·{' '}
                  {c.apply ? t('app.settings.calibrationOn') : t('app.settings.calibrationOff')}
                </li>
              ))}
            </ul>
          )}
          <a class="button" href={hrefFor('log', 'calibration')}>
            {t('app.settings.calibrationOpen')}
          </a>
        </section>
        <section class="card" aria-labelledby="settings-shifts">
          <h2 id="settings-shifts">{t('app.settings.shiftsHeading')}</h2>
          <div class="field-grid shift-grid">
            {SHIFT_IDS.map((shift) => (
              <TextField
                key={shift}
                id={`settings-shift-${shift}`}
                type="time"
                label={t('app.settings.shiftStart', { shift: t(`jobs.shift.${shift}`) })}
                value={s.shiftStarts[shift]}
                onInput={(v) => patch(settings, { shiftStarts: { ...s.shiftStarts, [shift]: v } })}
              />
            ))}
          </div>
          {!shiftsValid && (
            <p class="field-error" role="alert">
              {t('jobs.errors.shiftConfig.invalid')}
            </p>
          )}
          <p class="note">{t('app.settings.shiftsHint')}</p>
        </section>
      </Deferred>
      {/* Set up once per device by whoever installs it; an operator comes here for language, units and theme. */}
      <Deferred>
        <ShopServerCard />
      </Deferred>
    </div>
  );
}
