/**
 * Chemical formula notation used throughout Redox Cells.
 *
 *   "Fe2O3(s)"   solid          "Cu2+"      ion, charge written as digits + sign
 *   "H2O(l)"     liquid         "HPbO2-"    ion of charge −1 (sign alone means 1)
 *   "O2(g)"      gas            "Fe(OH)2(aq)" neutral dissolved species
 *
 * A charge like "CrO4 2-" is ambiguous when the formula ends in a digit ("HPbO2-" is HPbO2 with charge −1,
 * "Cu2+" is Cu with charge +2). Records in data/ therefore state their charge, and the parser uses that hint
 * to strip exactly the suffix that belongs to it. Without a hint, a charge may be separated by a space or "^"
 * ("CrO4 2-", "CrO4^2-"); otherwise digits directly before the sign are read as the charge.
 */

export type PhaseState = "s" | "l" | "g" | "aq";

export interface ParsedFormula {
  /** Atom counts per element symbol. */
  readonly elements: Readonly<Record<string, number>>;
  /** Net charge in units of e. */
  readonly charge: number;
  /** Physical state; ions without a suffix are aqueous. */
  readonly state: PhaseState;
}

const STATE_SUFFIX = /\((s|l|g|aq|cr)\)$/;

export class FormulaError extends Error {}

/** Parses a formula such as "Fe(OH)4-" or "Fe2O3(s)". `chargeHint` resolves the trailing-digit ambiguity. */
export function parseFormula(text: string, chargeHint?: number): ParsedFormula {
  let body = text.trim();
  let state: PhaseState | undefined;
  const stateMatch = STATE_SUFFIX.exec(body);
  if (stateMatch) {
    state = stateMatch[1] === "cr" ? "s" : (stateMatch[1] as PhaseState);
    body = body.slice(0, stateMatch.index);
  }
  let charge = 0;
  if (chargeHint !== undefined) {
    if (chargeHint !== 0) {
      const sign = chargeHint > 0 ? "+" : "-";
      const magnitude = Math.abs(chargeHint);
      const candidates = [
        `^${magnitude}${sign}`,
        ` ${magnitude}${sign}`,
        `${magnitude === 1 ? "" : magnitude}${sign}`,
        sign.repeat(magnitude),
      ];
      const suffix = candidates.find((c) => body.endsWith(c));
      if (!suffix) throw new FormulaError(`"${text}": charge ${chargeHint} is not written at the end of the formula`);
      body = body.slice(0, body.length - suffix.length);
      charge = chargeHint;
    }
  } else {
    const separated = /[\s^](\d*)([+-])$/.exec(body);
    const repeated = /([+-])\1+$/.exec(body);
    const plain = /(\d*)([+-])$/.exec(body);
    if (separated) {
      charge = (separated[1] ? Number(separated[1]) : 1) * (separated[2] === "+" ? 1 : -1);
      body = body.slice(0, separated.index);
    } else if (repeated) {
      charge = repeated[0].length * (repeated[1] === "+" ? 1 : -1);
      body = body.slice(0, repeated.index);
    } else if (plain) {
      charge = (plain[1] ? Number(plain[1]) : 1) * (plain[2] === "+" ? 1 : -1);
      body = body.slice(0, plain.index);
    }
  }
  if (/[+-]/.test(body)) throw new FormulaError(`"${text}": unexpected sign inside the formula`);
  const elements = parseBody(body, text);
  if (Object.keys(elements).length === 0) throw new FormulaError(`"${text}": no elements`);
  return { elements, charge, state: state ?? "aq" };
}

function parseBody(body: string, original: string): Record<string, number> {
  let pos = 0;
  const readGroup = (closing: string | null): Record<string, number> => {
    const counts: Record<string, number> = {};
    while (pos < body.length) {
      const ch = body[pos];
      if (ch === "(" || ch === "[") {
        pos++;
        const inner = readGroup(ch === "(" ? ")" : "]");
        const n = readNumber();
        for (const [el, c] of Object.entries(inner)) counts[el] = (counts[el] ?? 0) + c * n;
      } else if (ch === ")" || ch === "]") {
        if (ch !== closing) throw new FormulaError(`"${original}": unbalanced brackets`);
        pos++;
        return counts;
      } else if (ch === "·" || ch === "*" || ch === ".") {
        // hydrate dot: "CuCO3·Cu(OH)2" — the following coefficient multiplies the next unit
        pos++;
        const n = readNumber();
        const unit = readUnit();
        for (const [el, c] of Object.entries(unit)) counts[el] = (counts[el] ?? 0) + c * n;
      } else if (/[A-Z]/.test(ch)) {
        let symbol = ch;
        pos++;
        while (pos < body.length && /[a-z]/.test(body[pos])) symbol += body[pos++];
        const n = readNumber();
        counts[symbol] = (counts[symbol] ?? 0) + n;
      } else {
        throw new FormulaError(`"${original}": unexpected character "${ch}"`);
      }
    }
    if (closing !== null) throw new FormulaError(`"${original}": unbalanced brackets`);
    return counts;
  };
  const readUnit = (): Record<string, number> => {
    // a unit after a hydrate dot runs to the next dot or the end
    const start = pos;
    let depth = 0;
    while (pos < body.length) {
      const ch = body[pos];
      if (ch === "(" || ch === "[") depth++;
      if (ch === ")" || ch === "]") depth--;
      if (depth === 0 && (ch === "·" || ch === "*" || ch === ".")) break;
      pos++;
    }
    return parseBody(body.slice(start, pos), original);
  };
  const readNumber = (): number => {
    let digits = "";
    while (pos < body.length && /[0-9]/.test(body[pos])) digits += body[pos++];
    return digits ? Number(digits) : 1;
  };
  return readGroup(null);
}
