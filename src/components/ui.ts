/** Class names of the few controls every page shares (buttons, fields), so they look and focus alike. */
export const BTN = 'rounded border border-rule-strong bg-sheet px-2 py-0.5 text-xs text-ink hover:bg-paper active:bg-rule disabled:opacity-50 aria-disabled:opacity-50 aria-disabled:cursor-not-allowed';
export const BTN_PRIMARY = 'rounded bg-bar px-3 py-1.5 text-sm text-white hover:bg-ink disabled:opacity-60';
export const FIELD = 'rounded border border-rule-strong bg-sheet px-1.5 py-1 text-xs text-ink';
export const FIELD_WIDE = 'mt-1 block w-full rounded border border-rule-strong bg-sheet px-2 py-1.5 text-sm text-ink';
export const LINK = 'text-tension underline-offset-2 hover:underline';
export const TH = 'px-2 py-1 text-left font-medium text-ink-2';
export const TD = 'px-2 py-0.5';
