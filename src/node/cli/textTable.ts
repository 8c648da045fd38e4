/** Renders rows as a plain-text table with aligned columns; numbers right-aligned. */
export function textTable(header: readonly string[], rows: readonly (readonly string[])[], rightAligned: ReadonlySet<number> = new Set()): string {
  const width = header.map((h, c) => Math.max([...h].length, ...rows.map((r) => [...(r[c] ?? '')].length)));
  const pad = (s: string, c: number) => {
    const gap = ' '.repeat(width[c]! - [...s].length);
    return rightAligned.has(c) ? gap + s : s + gap;
  };
  const line = (cells: readonly string[]) => cells.map((s, c) => pad(s, c)).join('  ').trimEnd();
  return [line(header), width.map((w) => '─'.repeat(w)).join('  '), ...rows.map(line)].join('\n') + '\n';
}
