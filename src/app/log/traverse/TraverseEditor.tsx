/**
 * Entering a traverse on a phone: the hardness unit once, then depth and hardness per point. Enter
 * (or the keyboard's Next) moves on; past the last point it adds one with the depth suggested from
 * the last step, so a traverse is typed as a column of hardness readings. The tester's file can be
 * pasted or opened instead (PastePanel, with a preview). The ECD, surface and core hardness and the
 * chart follow the points as they are typed.
 */
import { useLayoutEffect, useRef, useState } from 'preact/hooks';
import { HARDNESS_UNITS, type HardnessUnit } from '../../../physics';
import { useScreenContext } from '../../settings/screenContext';
import { displayText, field } from '../../ui/fieldText';
import { UNIT_SYMBOLS } from '../../ui/format';
import { Segmented } from '../../ui/Segmented';
import { nextRow, rowField, type TraverseForm, type TraverseOutcome, type TraverseRow } from './traverseForm';
import { PastePanel } from './PastePanel';

const inputId = (index: number, name: 'depth' | 'hardness') => `lab-point-${index}-${name}`;

export function TraverseEditor({
  form,
  onChange,
  outcome,
}: {
  form: TraverseForm;
  onChange: (next: TraverseForm) => void;
  outcome: TraverseOutcome;
}) {
  const { t, units, locale, word } = useScreenContext();
  const [pasting, setPasting] = useState(false);
  const focusNextRef = useRef<string | null>(null);
  // Right after the new row is in the page, before the next key arrives.
  useLayoutEffect(() => {
    const id = focusNextRef.current;
    if (!id) return;
    focusNextRef.current = null;
    const input = document.getElementById(id);
    if (input instanceof HTMLInputElement) {
      input.focus();
      input.scrollIntoView({ block: 'nearest' });
    }
  });

  const rows = form.rows;
  const setRow = (index: number, changes: Partial<TraverseRow>) =>
    onChange({ ...form, rows: rows.map((row, i) => (i === index ? { ...row, ...changes } : row)) });
  const addRow = () => {
    focusNextRef.current = inputId(rows.length, 'hardness');
    onChange({ ...form, rows: [...rows, nextRow(rows, units.depth, locale)] });
  };
  const removeRow = (index: number) => {
    focusNextRef.current = rows.length > 1 ? inputId(Math.max(0, index - 1), 'hardness') : 'lab-add-point';
    onChange({ ...form, rows: rows.filter((_, i) => i !== index) });
  };
  const onKey = (index: number, name: 'depth' | 'hardness') => (event: KeyboardEvent) => {
    if (event.key !== 'Enter') return;
    event.preventDefault(); // not the form's submit
    const next = name === 'depth' ? index : index + 1;
    if (next < rows.length) document.getElementById(inputId(next, 'hardness'))?.focus();
    else addRow();
  };
  const unitChoices = HARDNESS_UNITS.map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u }));
  const depthSymbol = UNIT_SYMBOLS[units.depth] ?? units.depth;
  const listError = word(outcome.errors.points);

  return (
    <section class="traverse" aria-labelledby="lab-traverse-title">
      <h3 id="lab-traverse-title" class="traverse-title">
        {t('app.log.traverse.heading')}
      </h3>
      <Segmented
        name="lab-traverse-unit"
        legend={t('app.log.traverse.unitLegend')}
        value={form.unit}
        choices={unitChoices}
        onChange={(unit) => onChange({ ...form, unit: unit as HardnessUnit })}
      />
      {rows.length > 0 && (
        <div class="traverse-points" role="group" aria-label={t('app.log.traverse.pointsLabel')}>
          <div class="traverse-row traverse-head" aria-hidden="true">
            <span>{t('app.log.traverse.depthColumn', { unit: depthSymbol })}</span>
            <span>{t('app.log.traverse.hardnessColumn', { unit: UNIT_SYMBOLS[form.unit] ?? form.unit })}</span>
          </div>
          {rows.map((row, index) => {
            const n = index + 1;
            const depthError = word(outcome.errors[rowField(index, 'depth')]);
            const hardnessError = word(outcome.errors[rowField(index, 'hardness')]);
            const errorId = `lab-point-${index}-error`;
            return (
              <div key={index} class="traverse-point" data-point={n}>
                <div class="traverse-row">
                  <PointInput
                    id={inputId(index, 'depth')}
                    label={t('app.log.traverse.pointDepth', { n, unit: depthSymbol })}
                    value={displayText(row.depth, units.depth, locale)}
                    errorId={depthError ? errorId : undefined}
                    onInput={(text) => setRow(index, { depth: field(text, units.depth) })}
                    onKeyDown={onKey(index, 'depth')}
                  />
                  <PointInput
                    id={inputId(index, 'hardness')}
                    label={t('app.log.traverse.pointHardness', { n, unit: UNIT_SYMBOLS[row.unit || form.unit] })}
                    value={row.hardness}
                    errorId={hardnessError ? errorId : undefined}
                    onInput={(hardness) => setRow(index, { hardness })}
                    onKeyDown={onKey(index, 'hardness')}
                    unit={row.unit !== '' && row.unit !== form.unit ? UNIT_SYMBOLS[row.unit] : undefined}
                  />
                  <button
                    type="button"
                    class="button traverse-remove"
                    aria-label={t('app.log.traverse.remove', { n })}
                    onClick={() => removeRow(index)}
                  >
                    ×
                  </button>
                </div>
                {(depthError ?? hardnessError) && (
                  <p class="field-error" id={errorId}>
                    {depthError ?? hardnessError}
                  </p>
                )}
              </div>
            );
          })}
        </div>
      )}
      {listError && <p class="field-error">{listError}</p>}
      <p class="note">{t('app.log.traverse.entryHint')}</p>
      <div class="button-row traverse-actions">
        <button type="button" id="lab-add-point" class="button" onClick={addRow}>
          {t('app.log.traverse.add')}
        </button>
        <button type="button" class="button" aria-expanded={pasting} onClick={() => setPasting(!pasting)}>
          {t('app.log.traverse.pasteOpen')}
        </button>
      </div>
      {pasting && (
        <PastePanel
          unit={form.unit}
          onUse={(next) => {
            setPasting(false);
            onChange(next);
          }}
          onClose={() => setPasting(false)}
        />
      )}
    </section>
  );
}

/** One number of a point: decimal keyboard, Next on the key, label for screen readers (the columns are titled). */
function PointInput({
  id,
  label,
  value,
  errorId,
  onInput,
  onKeyDown,
  unit,
}: {
  id: string;
  label: string;
  value: string;
  /** The id of the row's error, when the error is this input's. */
  errorId: string | undefined;
  onInput: (text: string) => void;
  onKeyDown: (event: KeyboardEvent) => void;
  /** A unit shown beside the value (a point kept in another unit than the traverse's). */
  unit?: string | undefined;
}) {
  return (
    <span class="field-box traverse-box">
      <label class="visually-hidden" for={id}>
        {label}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        enterKeyHint="next"
        autoComplete="off"
        spellcheck={false}
        value={value}
        aria-invalid={errorId ? 'true' : undefined}
        aria-describedby={errorId}
        onInput={(e) => onInput(e.currentTarget.value)}
        onKeyDown={onKeyDown}
      />
      {unit && <span class="field-unit">{unit}</span>}
    </span>
  );
}
