// Limits of the shop's logo (issue 14): a small picture in the record's and the invoices' headers.
// A logo needs no more than a few hundred kilobytes; 2 MB leaves room for a camera shot of a sign.
export const LOGO_MAX_BYTES = 2 * 1024 * 1024;
/** Wider or taller than this is refused: far beyond any print header, and it keeps decoding cheap. */
export const LOGO_MAX_SIDE_PX = 4000;
/** What is stored: the picture scaled down to fit this box (a PDF header shows it at about 48 pt). */
export const LOGO_STORED_SIDE_PX = 600;
