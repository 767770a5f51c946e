// Reference check values kept as JSON fixtures beside the tests that read them (tests/reference/fixtures/): each
// record states what is checked, its inputs, the value, the tolerance, the unit and the source. The schema below
// validates a fixture when a test loads it and fails loudly, naming the file and the record.
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { z } from "zod";

/** A source names its publication with a year, or says `common practice`, or says `from memory` (DEVELOPERS.md). */
const SOURCED = /\b(1[89]|20)\d\d\b|common practice|from memory/i;

const sourceText = z
  .string()
  .min(1)
  .refine(
    (s) => SOURCED.test(s),
    "a source names authors, title, year (and table), or says common practice or from memory",
  );

/**
 * A value the records' answer must stay away from: the other compilation of a documented disagreement, which the
 * answer must miss by more than `moreThan`, so a silent switch of compilation fails.
 */
const differsFrom = z.strictObject({ value: z.number(), source: sourceText, moreThan: z.number().positive() });

/** One check value: the answer for `inputs` lies within `tolerance` of `value` (in `unit`), as `source` gives it. */
export function referenceCheck<I extends z.ZodType>(inputs: I) {
  return z.strictObject({
    id: z.string().min(1),
    inputs,
    value: z.number(),
    tolerance: z.number().nonnegative(),
    unit: z.string().min(1),
    source: sourceText,
    /** Set where the record was derived from this very value (or the same published formula): arithmetic only. */
    roundTrip: z.literal(true).optional(),
    differsFrom: differsFrom.optional(),
    note: z.string().min(1).optional(),
  });
}

export type ReferenceCheck<I> = {
  id: string;
  inputs: I;
  value: number;
  tolerance: number;
  unit: string;
  source: string;
  roundTrip?: true;
  differsFrom?: { value: number; source: string; moreThan: number };
  note?: string;
};

const fixtureFile = z.strictObject({ about: z.string().min(1), checks: z.array(z.unknown()).min(1) });

/** A zod issue as text: where it points (`inputs.pair.1`) and what is wrong. */
const describeIssue = (issue: z.core.$ZodIssue) =>
  `${issue.path.map(String).join(".") || "(record)"}: ${issue.message}`;

/** What a kind of check allows: its largest tolerance, and for documented disagreements the least gap required. */
export interface FixturePolicy<I> {
  /** The largest tolerance a record may carry (the method's stated tolerance): a looser fixture fails at load. */
  ceiling: (check: ReferenceCheck<I>) => number;
  /** Disagreement records: every one needs `differsFrom`, with `moreThan` at least this; others may not have one. */
  differsBy?: number;
}

/** Why a record breaks the policy, or null. */
function policyBreach<I>(check: ReferenceCheck<I>, policy: FixturePolicy<I>): string | null {
  const ceiling = policy.ceiling(check);
  if (check.tolerance > ceiling) return `tolerance ${check.tolerance} is above ${ceiling} allowed for this check`;
  if (policy.differsBy === undefined) return check.differsFrom ? "differsFrom is for disagreement fixtures only" : null;
  if (!check.differsFrom) return "a disagreement needs differsFrom (the other compilation's value and source)";
  if (check.differsFrom.moreThan < policy.differsBy)
    return `differsFrom.moreThan ${check.differsFrom.moreThan} is below ${policy.differsBy} required`;
  return null;
}

/**
 * Reads a fixture (a URL beside the test: `new URL("./fixtures/x.json", import.meta.url)`) and validates every
 * record against the schema and the policy; throws naming the file, the record's index and id, and what is wrong.
 */
export function loadReferenceFixture<I extends z.ZodType>(
  file: URL,
  inputs: I,
  policy: FixturePolicy<z.infer<I>>,
): ReferenceCheck<z.infer<I>>[] {
  const path = fileURLToPath(file);
  const name = path.replace(/^.*?(tests\/)/, "$1");
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(path, "utf8"));
  } catch (error) {
    throw new Error(`reference fixture ${name}: ${(error as Error).message}`);
  }
  const top = fixtureFile.safeParse(raw);
  if (!top.success) throw new Error(`reference fixture ${name}: ${top.error.issues.map(describeIssue).join("; ")}`);
  const schema = referenceCheck(inputs);
  return top.data.checks.map((record, index) => {
    const parsed = schema.safeParse(record);
    const check = parsed.success ? (parsed.data as ReferenceCheck<z.infer<I>>) : null;
    const wrong = check ? policyBreach(check, policy) : parsed.error!.issues.map(describeIssue).join("; ");
    if (check && wrong === null) return check;
    const id = (record as { id?: unknown } | null)?.id;
    throw new Error(`reference fixture ${name}, record ${index}${typeof id === "string" ? ` (${id})` : ""}: ${wrong}`);
  });
}

/** The record of a fixture with this id, for tests that check one value each; throws naming the id when absent. */
export function checkById<I>(checks: readonly ReferenceCheck<I>[], id: string): ReferenceCheck<I> {
  const found = checks.find((c) => c.id === id);
  if (!found) throw new Error(`no reference check "${id}" (have: ${checks.map((c) => c.id).join("; ")})`);
  return found;
}
