// A date as people write it in a sentence: "2 December 2026" (British order, as the rest of Parlour's words).
export const dateText = (d: Date): string =>
  new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' }).format(d);
