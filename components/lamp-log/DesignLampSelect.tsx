import { Select } from '@/components/ui/Select';

/** A lamp drawn in one of the enclosure's designs, as the lamp log offers it for linking. */
export type DesignLampOption = { objectId: string; label: string };

/**
 * Which lamp of the enclosure's designs a logged lamp is, so its readings can calibrate that design
 * lamp. A link to a lamp no design holds any more stays listed (and chosen) until it is changed.
 */
export function DesignLampSelect({
  label,
  designLamps,
  linked,
  error,
}: {
  label: string;
  designLamps: DesignLampOption[];
  /** The design lamp the logged lamp is linked to now, if any. */
  linked: string | null;
  error: string | null;
}) {
  const options =
    !linked || designLamps.some((d) => d.objectId === linked)
      ? designLamps
      : [{ objectId: linked, label: `${linked} (not in any design now)` }, ...designLamps];
  return (
    <Select label={label} name="designObjectId" defaultValue={linked ?? ''} error={error}>
      <option value="">Not linked</option>
      {options.map((d) => (
        <option key={d.objectId} value={d.objectId}>
          {d.label}
        </option>
      ))}
    </Select>
  );
}
