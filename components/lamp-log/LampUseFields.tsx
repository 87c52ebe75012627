import { Field } from '@/components/ui/Field';

/**
 * When a lamp first went on and how many hours a day it burns: together they give its age in burning
 * hours, which the decay and the reminders count. Shared by the form that logs a lamp and its settings.
 */
export function LampUseFields({
  firstUsedOn,
  hoursPerDay,
  today,
  error,
}: {
  firstUsedOn: string;
  hoursPerDay: number | string;
  /** Set when the fields are required (a new lamp): the latest day it can have gone on. */
  today?: string;
  error: (field: string) => string | null;
}) {
  const required = today !== undefined;
  return (
    <>
      <Field
        label="First switched on"
        name="firstUsedOn"
        type="date"
        defaultValue={firstUsedOn}
        max={today}
        required={required}
        error={error('firstUsedOn')}
      />
      <Field
        label="Hours a day"
        name="hoursPerDay"
        type="number"
        step="0.5"
        min="0.5"
        max="24"
        defaultValue={hoursPerDay}
        required={required}
        error={error('hoursPerDay')}
      />
    </>
  );
}
