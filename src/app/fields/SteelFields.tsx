/** Steel grade (nominal composition, flagged as such) or a custom composition, and core carbon. */
import { ALLOY_ELEMENTS, findGrade, STEEL_GRADES, type InputError } from '../../physics';
import { language, useT } from '../../i18n/useT';
import { ChoiceField } from '../ui/ChoiceField';
import { formatQuantity, UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { chooseGrade, CUSTOM_STEEL, type SteelForm } from './steel';

export interface SteelFieldsProps {
  idPrefix: string;
  steel: SteelForm;
  onChange: (next: SteelForm) => void;
  /** Errors by request path. */
  errors: Record<string, InputError>;
  /** Where the steel's fields sit in the request: '' (closed-form requests) or 'steel.' (cycles and plans). */
  path: '' | 'steel.';
  word: (error: InputError | undefined) => string | undefined;
}

export function SteelFields({ idPrefix, steel, onChange, errors, path, word }: SteelFieldsProps) {
  const t = useT();
  const grade = findGrade(steel.grade);
  const choices = [
    ...STEEL_GRADES.map((g) => ({ value: g.id, label: g.name })),
    { value: CUSTOM_STEEL, label: t('app.steel.custom') },
  ];
  const nominal = grade
    ? ALLOY_ELEMENTS.map((e) => `${e} ${formatQuantity(grade.composition[e], 'pct', language.value)}`).join(' · ')
    : undefined;
  return (
    <div class="steel">
      <ChoiceField
        id={`${idPrefix}-grade`}
        label={t('app.steel.grade')}
        value={grade ? grade.id : CUSTOM_STEEL}
        choices={choices}
        onChange={(id) => onChange(chooseGrade(steel, id))}
        hint={grade ? t('app.steel.nominal', { composition: nominal }) : t('app.steel.customHint')}
      />
      {!grade && (
        <div class="field-grid field-grid-5">
          {ALLOY_ELEMENTS.map((element) => (
            <NumberField
              key={element}
              compact
              id={`${idPrefix}-${element}`}
              label={element}
              unit=""
              unitLabel={UNIT_SYMBOLS.pct}
              value={steel.composition[element]}
              onInput={(v) => onChange({ ...steel, composition: { ...steel.composition, [element]: v } })}
              error={word(errors[`${path}composition.${element}`])}
            />
          ))}
        </div>
      )}
      <NumberField
        id={`${idPrefix}-core`}
        label={t('app.fields.coreCarbon')}
        unitLabel={UNIT_SYMBOLS.pctC}
        value={steel.coreCarbon}
        onInput={(v) => onChange({ ...steel, coreCarbon: v })}
        error={word(errors[`${path}coreCarbonPct`])}
      />
    </div>
  );
}
