/**
 * The look every data table shares: header cells, body cells, and figures right-aligned with
 * tabular digits so their decimals line up (text stays left-aligned).
 */
export const tableClass = 'w-full text-left text-sm';
export const theadClass = 'bg-ink-100 text-ink-700';
export const thClass = 'px-3 py-2 align-bottom font-semibold';
export const tdClass = 'px-3 py-2 align-top';
/** A cell or header of figures. */
export const numClass = 'text-right tabular-nums whitespace-nowrap';
