/** Class names shared by the app's screens, so controls look and focus alike everywhere. */

/** The keyboard focus ring (outline, offset, sky colour): one class in app/globals.css. */
const focus = 'focus-ring';

export const button = {
  primary: `inline-flex items-center justify-center gap-1.5 rounded-md bg-moss-600 px-4 py-2 text-body font-medium text-white hover:bg-moss-700 disabled:cursor-not-allowed disabled:opacity-60 ${focus}`,
  secondary: `inline-flex items-center justify-center gap-1.5 rounded-md border border-basalt-300 bg-white px-4 py-2 text-body font-medium text-basalt-800 hover:bg-basalt-50 disabled:cursor-not-allowed disabled:opacity-60 ${focus}`,
  danger: `inline-flex items-center justify-center gap-1.5 rounded-md bg-ember-600 px-4 py-2 text-body font-medium text-white hover:bg-ember-700 disabled:cursor-not-allowed disabled:opacity-60 ${focus}`,
  quiet: `inline-flex items-center gap-1 rounded px-2 py-1 text-body text-basalt-700 hover:bg-basalt-100 disabled:opacity-60 ${focus}`,
  quietDanger: `inline-flex items-center gap-1 rounded px-2 py-1 text-body text-ember-700 hover:bg-ember-50 disabled:opacity-60 ${focus}`,
};

export const input = `block w-full rounded-md border border-basalt-300 bg-white px-3 py-2 text-body text-basalt-900 placeholder:text-basalt-400 aria-[invalid=true]:border-ember-500 ${focus}`;

/** A text link: its utilities are gathered in one class in app/globals.css (lists repeat it in every row). */
export const link = 'app-link';

export const card = 'rounded-lg border border-basalt-200 bg-white shadow-sm';

export const focusRing = focus;
