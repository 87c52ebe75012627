import { button } from './styles';

/** Save and Cancel at the foot of an entry form; Save names what it does (add or save changes). */
export function FormActions({
  saving,
  submitLabel,
  onCancel,
}: {
  saving: boolean;
  submitLabel: string;
  onCancel: () => void;
}) {
  return (
    <div className="flex flex-wrap gap-2">
      <button type="submit" className={button.primary} disabled={saving}>
        {saving ? 'Saving…' : submitLabel}
      </button>
      <button type="button" className={button.secondary} onClick={onCancel} disabled={saving}>
        Cancel
      </button>
    </div>
  );
}
