/**
 * The tester's file, pasted or opened, shown as a preview before it replaces the typed points:
 * the columns and units read (and whether the file said so, else a choice here), each point, the
 * lines left out and why, and the ECD it gives. Nothing is stored: "Use" fills the form, which is
 * saved with the lab result. The pasted text stays while the panel is open.
 */
import { useMemo, useState } from 'preact/hooks';
import { CASE_CRITERIA, convert, HARDNESS_UNITS, readTraverse, type HardnessUnit } from '../../../physics';
import { caseCriterion } from '../../settings/state';
import { useScreenContext } from '../../settings/screenContext';
import { ChoiceField } from '../../ui/ChoiceField';
import { field } from '../../ui/fieldText';
import { formatInput, UNIT_SYMBOLS } from '../../ui/format';
import { ErrorNote } from '../../ui/Notices';
import { Segmented } from '../../ui/Segmented';
import { TextAreaField } from '../../ui/TextField';
import { PASTE_DEPTH_UNITS, readPaste, type PasteChoices, type PasteDepthUnit, type PasteRow } from './pasteTraverse';
import type { TraverseForm } from './traverseForm';

/** Largest file read (a traverse export is a few kB). */
const MAX_FILE_BYTES = 200_000;

const defaultDepthUnit = (unit: string): PasteDepthUnit =>
  (PASTE_DEPTH_UNITS as readonly string[]).includes(unit) ? (unit as PasteDepthUnit) : 'mm';

export function PastePanel({
  unit,
  onUse,
  onClose,
}: {
  unit: HardnessUnit;
  onUse: (form: TraverseForm) => void;
  onClose: () => void;
}) {
  const { t, units, locale, show, word } = useScreenContext();
  const [text, setText] = useState('');
  const [fileProblem, setFileProblem] = useState<string | undefined>(undefined);
  const [choices, setChoices] = useState<PasteChoices>(() => ({
    depthUnit: defaultDepthUnit(units.depth),
    hardnessUnit: unit,
  }));
  const preview = useMemo(() => (text.trim() === '' ? undefined : readPaste(text, choices)), [text, choices]);
  const limit = CASE_CRITERIA[caseCriterion.value];
  const check = useMemo(
    () => (preview && preview.points.length > 0 ? readTraverse({ points: preview.points, limit }) : undefined),
    [preview, limit],
  );

  const openFile = async (input: HTMLInputElement) => {
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    if (file.size > MAX_FILE_BYTES) {
      setFileProblem(t('app.log.traverse.paste.fileTooLarge', { size: show.number(MAX_FILE_BYTES / 1000, 0) }));
      return;
    }
    try {
      setText(await file.text());
      setFileProblem(undefined);
    } catch {
      setFileProblem(t('app.log.traverse.paste.fileUnreadable'));
    }
  };

  const use = () => {
    if (!preview || !check?.ok) return;
    onUse({
      unit: preview.hardnessUnit,
      rows: preview.points.map((p) => ({
        depth: field(formatInput(p.depthMm, 'mm', locale), 'mm'),
        hardness: formatInput(p.value, '', locale),
        unit: '',
      })),
    });
  };

  // The unit is in the column's heading.
  const depthNumber = (mm: number) => {
    const converted = convert(mm, 'mm', units.depth);
    return converted.ok ? formatInput(converted.value, units.depth, locale) : '';
  };
  const unitNote = (fromFile: boolean) =>
    fromFile ? t('app.log.traverse.paste.unitFromFile') : t('app.log.traverse.paste.unitNotInFile');
  const columnChoices = preview?.columns.map((name, i) => ({ value: String(i), label: name })) ?? [];
  const skipped = preview?.rows.filter((r): r is PasteRow & { problem: NonNullable<PasteRow['problem']> } =>
    Boolean(r.problem),
  );

  return (
    <div class="paste-panel" role="region" aria-labelledby="lab-paste-title">
      <h4 id="lab-paste-title">{t('app.log.traverse.paste.title')}</h4>
      <TextAreaField
        id="lab-paste-text"
        label={t('app.log.traverse.paste.textLabel')}
        hint={t('app.log.traverse.paste.textHint')}
        maxLength={MAX_FILE_BYTES}
        value={text}
        onInput={setText}
      />
      <div class="field">
        <label for="lab-paste-file">{t('app.log.traverse.paste.file')}</label>
        <input
          id="lab-paste-file"
          class="file-input"
          type="file"
          accept=".csv,.txt,.tsv,text/csv,text/plain"
          onChange={(e) => void openFile(e.currentTarget)}
        />
      </div>
      <ErrorNote message={fileProblem} />
      {preview && (
        <div class="paste-preview" aria-live="polite">
          <h5>{t('app.log.traverse.paste.preview', { count: preview.points.length })}</h5>
          {/* One under the other: the file's own headings can be long. */}
          {preview.columns.length > 2 && (
            <div class="paste-columns">
              <ChoiceField
                wrap
                id="lab-paste-depth-column"
                label={t('app.log.traverse.paste.depthColumn')}
                value={String(preview.depthColumn)}
                choices={columnChoices}
                onChange={(v) => setChoices({ ...choices, depthColumn: Number(v) })}
              />
              <ChoiceField
                wrap
                id="lab-paste-hardness-column"
                label={t('app.log.traverse.paste.hardnessColumn')}
                value={String(preview.hardnessColumn)}
                choices={columnChoices}
                onChange={(v) => setChoices({ ...choices, hardnessColumn: Number(v) })}
              />
            </div>
          )}
          {preview.depthUnitFromFile ? (
            <p class="note" data-paste-unit="depth">
              {t('app.log.traverse.paste.depthUnit')} {UNIT_SYMBOLS[preview.depthUnit]} {unitNote(true)}
            </p>
          ) : (
            <Segmented
              name="lab-paste-depth-unit"
              legend={`${t('app.log.traverse.paste.depthUnit')} ${unitNote(false)}`}
              value={preview.depthUnit}
              choices={PASTE_DEPTH_UNITS.map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u }))}
              onChange={(v) => setChoices({ ...choices, depthUnit: v as PasteDepthUnit })}
            />
          )}
          {preview.hardnessUnitFromFile ? (
            <p class="note" data-paste-unit="hardness">
              {t('app.log.traverse.paste.hardnessUnit')} {UNIT_SYMBOLS[preview.hardnessUnit]} {unitNote(true)}
            </p>
          ) : (
            <Segmented
              name="lab-paste-hardness-unit"
              legend={`${t('app.log.traverse.paste.hardnessUnit')} ${unitNote(false)}`}
              value={preview.hardnessUnit}
              choices={HARDNESS_UNITS.map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u }))}
              onChange={(v) => setChoices({ ...choices, hardnessUnit: v as HardnessUnit })}
            />
          )}
          {preview.points.length > 0 && (
            <div class="table-wrap">
              <table class="numbers paste-table">
                <caption>{t('app.log.traverse.paste.caption')}</caption>
                <thead>
                  <tr>
                    <th scope="col">{t('app.log.traverse.paste.point')}</th>
                    <th scope="col">{t('app.log.traverse.depthColumn', { unit: UNIT_SYMBOLS[units.depth] })}</th>
                    <th scope="col">
                      {t('app.log.traverse.hardnessColumn', { unit: UNIT_SYMBOLS[preview.hardnessUnit] })}
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {preview.points.map((p, i) => (
                    <tr key={i}>
                      <th scope="row">{i + 1}</th>
                      <td>{depthNumber(p.depthMm)}</td>
                      <td>{formatInput(p.value, '', locale)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          {skipped && skipped.length > 0 && (
            <div class="paste-skipped">
              <p class="note">{t('app.log.traverse.paste.skipped', { count: skipped.length })}</p>
              <ul>
                {skipped.map((r) => (
                  <li key={r.line}>
                    {t(`app.log.traverse.paste.problem.${r.problem.code}`, {
                      line: r.line,
                      column: t(`app.log.traverse.paste.column.${r.problem.column}`),
                      text: r.problem.code === 'notNumber' ? r.problem.text.slice(0, 20) : '',
                    })}
                  </li>
                ))}
              </ul>
            </div>
          )}
          {check && !check.ok && (
            <p class="field-error" role="status">
              {word(check.error)}
            </p>
          )}
          <p class="note">{t('app.log.traverse.paste.replaceNote')}</p>
        </div>
      )}
      <div class="button-row">
        <button type="button" class="button button-primary" disabled={!check?.ok} onClick={use}>
          {t('app.log.traverse.paste.use', { count: preview?.points.length ?? 0 })}
        </button>
        <button type="button" class="button" onClick={onClose}>
          {t('app.log.traverse.paste.close')}
        </button>
      </div>
    </div>
  );
}
