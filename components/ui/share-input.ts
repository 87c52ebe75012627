/**
 * The attributes of an input for a share of UVB passing something between lamp and basking spot or meter
 * (a lid, a mesh, a screen): a number from 0.01 to 1, the range the API accepts, typed on a decimal keypad.
 */
export const shareInput = {
  type: 'number',
  step: '0.01',
  min: '0.01',
  max: '1',
  inputMode: 'decimal',
} as const;
