// A quote or an invoice prints as one clean sheet: no navigation, no forms, the lines full width.
export const PRINT_CSS = `@media print {
  @page { size: A4; margin: 14mm; }
  html, body { font-size: 10pt; background: #fff; }
  header, nav, .no-print, form { display: none !important; }
  main { max-width: none !important; padding: 0 !important; }
  .print-sheet { border: 0 !important; padding: 0 !important; grid-column: 1 / -1; }
  .print-sheet table { min-width: 0 !important; }
}`;
