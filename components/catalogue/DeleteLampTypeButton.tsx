import { ConfirmDeleteButton } from '@/components/ui/ConfirmDeleteButton';

/** Removes a catalogue entry; the server refuses (409) while lamps in the lamp log use it. */
export function DeleteLampTypeButton({ id, name }: { id: number; name: string }) {
  return (
    <ConfirmDeleteButton
      url={`/api/lamp-types/${id}`}
      confirm={`Remove “${name}” from the catalogue? Designs keep their lamps.`}
      then="/lamp-catalogue"
      label="Remove"
      busyLabel="Removing…"
      failure="The lamp type could not be removed."
    />
  );
}
