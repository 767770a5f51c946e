/**
 * Shape of the thermodynamic records in data/species/*.json, validated with zod at load.
 *
 * One file per chemical system (a metal, water, or a ligand). Every species record names the source of its
 * values by a key into the file's `references`. Units: ΔG°f and ΔH°f in kJ/mol, S° and Cp° in J/(mol·K), all at
 * 298.15 K and 1 bar (0.1 MPa); ions on the conventional scale (H+ zero in G, H, S, Cp at every temperature).
 */
import { z } from "zod";

export const speciesRecordSchema = z
  .object({
    /** Formula in the project's notation: "Fe2O3(s)", "Cu2+", "HPbO2-", "Fe(OH)3(aq)". Unique in the database. */
    formula: z.string().min(1),
    /** Net charge; resolves notation ambiguity ("HPbO2-" is −1, "Cu2+" is +2). */
    charge: z.number().int().min(-6).max(6),
    /** s solid, l liquid, g gas, aq dissolved. */
    state: z.enum(["s", "l", "g", "aq"]),
    /** Trade or mineral name where one exists (hematite, cuprite…), else a plain description. */
    name: z.string().optional(),
    /** Standard Gibbs energy of formation, kJ/mol. */
    dGf: z.number().finite(),
    /** Standard enthalpy of formation, kJ/mol; null where not tabulated. */
    dHf: z.number().finite().nullable(),
    /** Standard (third-law or conventional) entropy, J/(mol·K); null where not tabulated. */
    S: z.number().finite().nullable(),
    /** Standard heat capacity, J/(mol·K); null where not tabulated (reactions with it then take ΔCp = 0). */
    Cp: z.number().finite().nullable(),
    /** Key into the file's references for ΔG°f, ΔH°f and S°. */
    source: z.string().min(1),
    /** Key into references for Cp° when it comes from elsewhere. */
    cpSource: z.string().optional(),
    /** Key into references for S° when it comes from elsewhere (a derivation or a named estimation method). */
    entropySource: z.string().optional(),
    /** Anything a reviewer should know: estimates, polymorph chosen, disagreement between compilations. */
    note: z.string().optional(),
  })
  .strict();

export const systemFileSchema = z
  .object({
    /** Element symbol of the metal ("Fe"), "water", or a ligand element ("C", "S", "Cl"). */
    system: z.string().min(1),
    kind: z.enum(["metal", "water", "ligand"]),
    /** Plain-language title: "Iron". */
    title: z.string().min(1),
    /** Which compilation the file follows and why; where compilations disagree, which one is used. */
    compilation: z.string().min(1),
    /** Full citations by key. */
    references: z.record(z.string(), z.string().min(10)),
    species: z.array(speciesRecordSchema).min(1),
  })
  .strict();

export type SpeciesRecord = z.infer<typeof speciesRecordSchema>;

export const elementRecordSchema = z
  .object({
    symbol: z.string().regex(/^[A-Z][a-z]?$/),
    name: z.string(),
    /** Standard atomic weight, g/mol. */
    atomicWeight: z.number().positive(),
    /** Formula of the element in its reference state at 298.15 K, 1 bar ("Fe(s)", "O2(g)"). */
    referenceState: z.string(),
  })
  .strict();

export const elementsFileSchema = z
  .object({
    source: z.string().min(10),
    elements: z.array(elementRecordSchema).min(1),
  })
  .strict();

export type ElementRecord = z.infer<typeof elementRecordSchema>;
