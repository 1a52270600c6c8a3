/** The permitting caution around any plain-text output (every command prints it first and last). */
import { CAUTION } from "./contract";

function wrap(text: string, width: number): string {
  const lines: string[] = [];
  let line = "";
  for (const w of text.split(/\s+/)) {
    if (line && line.length + w.length + 1 > width) {
      lines.push(line);
      line = "";
    }
    line += (line ? " " : "") + w;
  }
  if (line) lines.push(line);
  return lines.join("\n");
}

/** The caution between two rules, wrapped to `width` columns. */
export function cautionBlock(width = 96): string {
  const rule = "─".repeat(width);
  return `${rule}\n${wrap(CAUTION, width)}\n${rule}\n`;
}

/** `text` with the caution block before and after it. */
export function withCaution(text: string, width = 96): string {
  const body = text.endsWith("\n") ? text : text + "\n";
  return `${cautionBlock(width)}\n${body}\n${cautionBlock(width)}`;
}
