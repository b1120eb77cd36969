/**
 * Print rules for the event report: the app's header and menu drop out, the page prints black on
 * white whatever the screen theme, tables keep their rows together and links print as text. Only
 * rendered on the report page, so other pages print as they are.
 */
const PRINT_CSS = `
@media print {
  :root, :root[data-theme="dark"], :root[data-theme="light"] {
    --bw-canvas: #ffffff; --bw-surface: #ffffff; --bw-raised: #f1f1f1; --bw-line: #bbbbbb;
    --bw-ink: #000000; --bw-muted: #444444; --bw-accent: #1f4e79; --bw-focus: #7a4d00;
    --bw-ok: #1d5e37; --bw-caution: #6b4a00; --bw-danger: #8c2520;
    color-scheme: light;
  }
  header:has(+ div > nav[aria-label="Main"]), nav[aria-label="Main"], [data-print-hide] { display: none !important; }
  main { padding: 0 !important; }
  .overflow-x-auto { overflow: visible !important; }
  table { font-size: 9px; }
  th, td { padding: 2px 4px !important; white-space: normal !important; }
  a { color: inherit !important; text-decoration: none !important; }
  tr, figure, section { break-inside: avoid; }
  h2 { break-after: avoid; }
  @page { margin: 14mm; }
}
`;

export function PrintStyles() {
  return <style>{PRINT_CSS}</style>;
}
