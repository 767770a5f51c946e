/**
 * The field separator of a table: the one of tab, semicolon and comma that occurs most often, outside quotes, on
 * its header line (a comma when none occurs). One rule for the task pane and the command line.
 */
export const DELIMITERS = ["\t", ";", ","] as const;

export function guessDelimiter(headerLine: string): string {
  const counts: Record<string, number> = { "\t": 0, ",": 0, ";": 0 };
  let quoted = false;
  for (const ch of headerLine) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && ch in counts) counts[ch]++;
  }
  let best = ",";
  for (const d of DELIMITERS) if (counts[d] > counts[best]) best = d;
  return best;
}
