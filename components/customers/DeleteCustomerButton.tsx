import { ConfirmDeleteButton } from '@/components/ui/ConfirmDeleteButton';

/** Deletes the person after a plain confirmation that says what stays. */
export function DeleteCustomerButton({ id, name }: { id: number; name: string }) {
  return (
    <ConfirmDeleteButton
      url={`/api/customers/${id}`}
      confirm={`Delete ${name}? Their name, e-mail, phone, notes and consent are removed. The lamp tests stay without their name, for the shop's own lamp statistics.`}
      then="/customers"
      label="Delete customer"
      failure="The customer could not be deleted."
    />
  );
}
