import { button, focusRing } from '@/components/ui/styles';

/** Class names of the designs screens: the app's own buttons, plus compact ones for dense lists. */
export const btn = {
  primary: button.primary,
  secondary: button.secondary,
  small: `inline-flex items-center rounded px-2 py-0.5 text-caption font-medium text-basalt-700 hover:bg-basalt-100 disabled:opacity-50 ${focusRing}`,
  danger: `inline-flex items-center rounded px-2 py-0.5 text-caption font-medium text-ember-700 hover:bg-ember-50 disabled:opacity-50 ${focusRing}`,
};

/** An inline (not full-width) text box or select. */
export const input = `rounded-md border border-basalt-300 bg-white px-3 py-1.5 text-body text-basalt-900 placeholder:text-basalt-400 ${focusRing}`;
