/** The foot of every log form: why it was not saved (if so), then save and cancel, thumb-sized. */
import { useT } from '../../i18n/useT';

export interface FormActionsProps {
  error: string | undefined;
  submitLabel: string;
  disabled: boolean;
  onCancel: () => void;
}

export function FormActions({ error, submitLabel, disabled, onCancel }: FormActionsProps) {
  const t = useT();
  return (
    <>
      {error && (
        <p class="error-note" role="alert">
          {error}
        </p>
      )}
      <div class="button-row">
        <button type="submit" class="button button-primary" disabled={disabled}>
          {submitLabel}
        </button>
        <button type="button" class="button" onClick={onCancel}>
          {t('app.log.cancel')}
        </button>
      </div>
    </>
  );
}
