/**
 * Number.prototype.toFixed for 0–3 decimals without its cost: toFixed formats the double's exact decimal expansion,
 * slowly, and a diagram's sample titles call it for tens of thousands of markers. The value is scaled to an integer
 * of the last decimal and its digits written; within 10⁻⁶ of a rounding tie, and beyond 10⁹ of that unit (where the
 * scaling's rounding could matter), the answer is left to toFixed itself, so the text is always toFixed's. Also the
 * trimmed two-decimal form of the diagrams' coordinates (twoDecimals).
 */

const SCALE = [1, 10, 100, 1000] as const;

/** x.toFixed(digits) for digits 0–3 (other digit counts go to toFixed). */
export function fixedText(x: number, digits: number): string {
  const scale = SCALE[digits];
  if (scale === undefined) return x.toFixed(digits);
  const scaled = Math.abs(x) * scale;
  if (!(scaled < 1e9) || Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6) return x.toFixed(digits);
  const n = Math.round(scaled);
  // toFixed keeps the sign of a negative value that rounds to zero ("-0.00"), and writes −0 as "0.00"
  const sign = x < 0 ? "-" : "";
  if (digits === 0) return sign + String(n);
  const whole = Math.floor(n / scale);
  const fraction = String(n - whole * scale).padStart(digits, "0");
  return `${sign}${whole}.${fraction}`;
}

/** ".01" … ".99" without a trailing zero, "" for 0: the decimals of a coordinate in hundredths of a pixel. */
const HUNDREDTHS: readonly string[] = Array.from({ length: 100 }, (_, f) =>
  f === 0 ? "" : `.${String(f).padStart(2, "0").replace(/0$/, "")}`,
);

/**
 * A coordinate to 2 decimals as Number(v.toFixed(2)).toString() writes it, from the integer of hundredths (toFixed
 * formats the double's exact decimal expansion, slowly: a diagram has tens of thousands of markers); within 10⁻⁶ of
 * a tie, and for huge values, it leaves the answer to toFixed.
 */
export function twoDecimals(v: number): string {
  const scaled = v * 100;
  if (!(Math.abs(scaled) < 1e9) || Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6)
    return Number(v.toFixed(2)).toString();
  const n = Math.round(scaled);
  const a = n < 0 ? -n : n;
  const whole = Math.floor(a / 100);
  const text = String(whole) + HUNDREDTHS[a - whole * 100];
  return n < 0 ? "-" + text : text;
}
