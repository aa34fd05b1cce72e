/** A labelled free-text input (e.g. a step's name). */
export interface TextFieldProps {
  id: string;
  label: string;
  value: string;
  onInput: (value: string) => void;
  placeholder?: string | undefined;
  maxLength?: number;
}

export function TextField({ id, label, value, onInput, placeholder, maxLength = 40 }: TextFieldProps) {
  return (
    <div class="field">
      <label for={id}>{label}</label>
      <div class="field-box">
        <input id={id} type="text" autoComplete="off" value={value} placeholder={placeholder} maxLength={maxLength} onInput={(e) => onInput(e.currentTarget.value)} />
      </div>
    </div>
  );
}

/** A large checkbox with its label. */
export function CheckField({ id, label, checked, onChange }: { id: string; label: string; checked: boolean; onChange: (checked: boolean) => void }) {
  return (
    <label class="check" for={id}>
      <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.currentTarget.checked)} />
      <span>{label}</span>
    </label>
  );
}
