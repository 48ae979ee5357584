/** Console helpers shared by the scripts: one prefix, optional colour, aligned tables. */

const useColour = process.stdout.isTTY === true && !('NO_COLOR' in process.env);

const codes = { bold: 1, dim: 2, red: 31, green: 32, yellow: 33, cyan: 36 } as const;
export type Colour = keyof typeof codes;

export function paint(colour: Colour, text: string): string {
  return useColour ? `\u001b[${codes[colour]}m${text}\u001b[0m` : text;
}

export function log(message: string): void {
  process.stdout.write(`${paint('cyan', '[pinfield]')} ${message}\n`);
}

/** Lays out rows under headers with columns padded to the widest cell. */
export function formatTable(headers: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = headers.map((header, column) => Math.max(header.length, ...rows.map((row) => (row[column] ?? '').length)));
  const line = (cells: readonly string[]): string =>
    cells
      .map((cell, column) => cell.padEnd(widths[column] ?? 0))
      .join('  ')
      .trimEnd();
  const rule = widths.map((width) => '-'.repeat(width)).join('  ');
  return [line(headers), rule, ...rows.map(line)].join('\n');
}

export function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
