/**
 * Splits CSV text into records of cells after RFC 4180: commas between cells, double quotes around
 * a cell that holds commas, quotes ("" inside) or line breaks, CRLF or LF line ends. Each record
 * keeps the file line it starts on, so messages can point at it.
 */
export interface CsvRecord {
  line: number;
  cells: string[];
}

export class CsvSyntaxError extends Error {
  constructor(
    readonly line: number,
    problem: string,
  ) {
    super(`line ${line}: ${problem}`);
    this.name = "CsvSyntaxError";
  }
}

export function splitCsvRecords(text: string): CsvRecord[] {
  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let cells: string[] = [];
  let cell = "";
  let line = 1;
  let recordLine = 1;
  let quoted = false;
  let cellStarted = false;
  let afterQuote = false;

  const endCell = () => {
    cells.push(cell);
    cell = "";
    cellStarted = false;
    afterQuote = false;
  };
  const endRecord = () => {
    endCell();
    // A blank line is no record at all.
    if (!(cells.length === 1 && cells[0]!.trim() === "")) records.push({ line: recordLine, cells });
    cells = [];
  };

  for (let k = 0; k < source.length; k++) {
    const ch = source[k]!;
    if (quoted) {
      if (ch === '"') {
        if (source[k + 1] === '"') {
          cell += '"';
          k++;
        } else {
          quoted = false;
          afterQuote = true;
        }
      } else {
        if (ch === "\n") line++;
        cell += ch;
      }
      continue;
    }
    if (ch === '"' && !cellStarted) {
      quoted = true;
      cellStarted = true;
    } else if (ch === ",") {
      endCell();
    } else if (ch === "\n" || ch === "\r") {
      if (ch === "\r" && source[k + 1] === "\n") k++;
      endRecord();
      line++;
      recordLine = line;
    } else {
      if (afterQuote && ch.trim() !== "") throw new CsvSyntaxError(line, "text follows a closing quote in the same cell");
      cell += ch;
      cellStarted = true;
    }
  }
  if (quoted) throw new CsvSyntaxError(recordLine, "a quoted cell is never closed");
  if (cellStarted || cells.length > 0 || cell !== "") endRecord();
  return records;
}

/**
 * One CSV cell for output: quoted when it holds a comma, quote or line break (RFC 4180, section 2).
 * Free text that a spreadsheet would read as a formula (starting with =, +, -, @ or a tab) gets a
 * leading apostrophe, so an exported note can never run as one; numbers are written as numbers.
 */
export function csvCell(value: string | number | boolean | null | undefined, verbatim = false): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  const text = !verbatim && typeof value === "string" && /^[=+\-@\t\r]/.test(value) ? `'${value}` : String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * A whole CSV document: header row, then rows, CRLF line ends (RFC 4180). `verbatim` writes text
 * exactly as stored (no formula guard), for exports whose cells must be re-checked byte for byte.
 */
export function csvDocument(header: readonly string[], rows: Iterable<readonly (string | number | boolean | null | undefined)[]>, options: { verbatim?: boolean } = {}): string {
  const cell = (value: string | number | boolean | null | undefined) => csvCell(value, options.verbatim);
  const lines = [header.map(cell).join(",")];
  for (const row of rows) lines.push(row.map(cell).join(","));
  return `${lines.join("\r\n")}\r\n`;
}
