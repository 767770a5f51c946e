/**
 * A formula as it is typeset on the diagram: counts as subscripts, the ionic charge as a superscript, the state
 * suffix as plain text ("Fe(OH)4-" → Fe(OH)₄⁻, "Cu2+" → Cu²⁺, "Fe2O3(s)" → Fe₂O₃(s)). The charge comes from the
 * species record, which resolves "Cu2+" (charge +2) against "HPbO2-" (O₂, charge −1).
 */

export type Segment = { readonly text: string; readonly kind: "normal" | "sub" | "sup" };

const STATE = /\((s|l|g|aq|cr)\)$/;

export function formulaSegments(formula: string, charge: number): Segment[] {
  let body = formula;
  let state = "";
  const stateMatch = STATE.exec(body);
  if (stateMatch) {
    state = stateMatch[0];
    body = body.slice(0, stateMatch.index);
  }
  let chargeText = "";
  if (charge !== 0) {
    const sign = charge > 0 ? "+" : "-";
    const magnitude = Math.abs(charge);
    for (const suffix of [
      `^${magnitude}${sign}`,
      ` ${magnitude}${sign}`,
      `${magnitude === 1 ? "" : magnitude}${sign}`,
      sign.repeat(magnitude),
    ]) {
      if (body.endsWith(suffix)) {
        body = body.slice(0, body.length - suffix.length);
        chargeText = (magnitude === 1 ? "" : String(magnitude)) + (charge > 0 ? "+" : "\u2212");
        break;
      }
    }
  }
  const segments: Segment[] = [];
  const push = (text: string, kind: Segment["kind"]) => {
    const last = segments[segments.length - 1];
    if (last && last.kind === kind) segments[segments.length - 1] = { text: last.text + text, kind };
    else segments.push({ text, kind });
  };
  for (let i = 0; i < body.length; i++) {
    const ch = body[i];
    const prev = i > 0 ? body[i - 1] : "";
    const isCount =
      /[0-9]/.test(ch) &&
      i > 0 &&
      (/[A-Za-z)\]]/.test(prev) || (/[0-9]/.test(prev) && segments[segments.length - 1]?.kind === "sub"));
    push(ch, isCount ? "sub" : "normal");
  }
  if (chargeText) push(chargeText, "sup");
  if (state) push(state, "normal");
  return segments;
}

/** Plain text of a formula with the charge written as in the records (for titles and tests). */
export function segmentsText(segments: readonly Segment[]): string {
  return segments.map((s) => s.text).join("");
}
