// The sheet's print stylesheet: no navigation or buttons (the shell marks those no-print), the paper the
// printer has (A4 or Letter: `size: auto`), each member from a new page, tables and diagrams kept whole.
const CSS = `
@media print {
  @page { size: auto; margin: 14mm 12mm 16mm; }
  html, body { background: #fff !important; font-size: 11pt; }
  main { max-width: none !important; padding: 0 !important; }
  .sheet-document { gap: 10pt !important; }
  .sheet-member { break-before: page; border-top-width: 0 !important; }
  .sheet-keep, .sheet-table tr, figure, svg { break-inside: avoid; }
  .sheet-document h1 { font-size: 20pt; }
  .sheet-document h2 { font-size: 15pt; }
  .sheet-document a { color: inherit; text-decoration: none; }
  .sheet-print-blocked { display: block !important; }
  .sheet-print-blocked ~ .sheet-document { display: none !important; }
}
`;

export function SheetPrintStyles() {
  return <style>{CSS}</style>;
}
