import { ConfirmDeleteButton } from '@/components/ui/ConfirmDeleteButton';

/** Deletes a sheet after a plain confirmation; enclosures keep their species name. */
export function DeleteSheetButton({ id, name }: { id: number; name: string }) {
  return (
    <ConfirmDeleteButton
      url={`/api/species/${id}`}
      confirm={`Delete the species sheet “${name}”? Enclosures that name this species keep their designs.`}
      then="/species"
      failure="The sheet could not be deleted."
    />
  );
}
