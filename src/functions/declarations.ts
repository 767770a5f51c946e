/**
 * The worksheet functions as the spreadsheet shows them (namespace REDOX): id, help text, arguments and result, and
 * the implementation each one delegates to. The arguments shared by the point functions (SPECIES, REGIME, BOUNDARY,
 * DISSOLVED, ASSESS) are written once below. `npm run generate:functions` writes functions.ts from this table —
 * the JSDoc-annotated declarations the custom-functions metadata plugin reads to write functions.json (the plugin
 * reads only top-level function declarations, so they cannot be built at run time); tests/unit/functions-generated
 * fails while functions.ts is stale.
 */

/** One argument: its name in the spreadsheet, the help text (units, range, default) and whether it may be omitted. */
export interface ArgumentDeclaration {
  readonly name: string;
  readonly description: string;
  readonly optional?: true;
}

export interface WorksheetFunctionDeclaration {
  /** REDOX.<id>; the exported function is its lower-case name. */
  readonly id: string;
  readonly description: string;
  readonly parameters: readonly ArgumentDeclaration[];
  readonly returns: string;
  /** The implementation: its module in src/functions (no extension) and its exported name. */
  readonly implementation: readonly [module: string, name: string];
}

import {
  boundText,
  DEFAULT_ACTIVITY,
  DEFAULT_CELSIUS,
  MAX_ACTIVITY,
  MAX_CELSIUS,
  MIN_CELSIUS,
  PH_MAX,
  PH_MIN,
} from "../chemistry";

const required = (name: string, description: string): ArgumentDeclaration => ({ name, description });
const optional = (name: string, description: string): ArgumentDeclaration => ({ name, description, optional: true });

const ELECTRODE_NAMES =
  "SHE, SCE, AgCl-sat, AgCl-3.5M, AgCl-3M, AgCl-1M, AgCl-sea, CSE, MSE, HgO-1M, AgCl-EPB or RHE (case-insensitive; common spellings accepted)";
const ELEMENT_NAMES = "Fe, Cu, Zn, Pb, Ni, Cr, Al, Mn, Sn, Co, Mg, Ti, Ag, Cd, Mo, V, W, Bi, Au, Pt, Hg, As, Sb, Se, U";
const PRESSURE_NOTE = "1 atm below 100 °C, saturation pressure above";
/** The temperature argument as the water and scale functions word it, and as the species functions do. */
const CELSIUS_RANGE = `${MIN_CELSIUS} to ${MAX_CELSIUS}`;
const WATER_TEMPERATURE = `Temperature in °C, ${CELSIUS_RANGE} (default ${DEFAULT_CELSIUS}): ${PRESSURE_NOTE}.`;
const TEMPERATURE = `Temperature in °C, ${CELSIUS_RANGE} (${PRESSURE_NOTE}). Default ${DEFAULT_CELSIUS}.`;
const ELECTRODE_TEMPERATURE = `Temperature of the reference electrode in °C (default ${DEFAULT_CELSIUS}).`;
/** The pH domain as the help text writes it: −2 to 16. */
const PH_RANGE = `${boundText(PH_MIN)} to ${PH_MAX}`;
/** The default activity as the help text writes it: 1e-6. */
const ACTIVITY_DEFAULT = `Default ${DEFAULT_ACTIVITY.toExponential()}.`;

const SOLUTION_PH = required("pH", `pH of the solution, ${PH_RANGE}.`);
const PH = required("pH", `pH, from ${PH_MIN} to ${PH_MAX}.`);
const METAL = required("element", "Metal symbol or name.");
const POTENTIAL = required("potential", "Potential in volts vs SHE.");
const ACTIVITY = optional("activity", `Activity of dissolved metal species. ${ACTIVITY_DEFAULT}`);

/** The water of a point: ligand totals and ionic strength, in this order (between temperature or activity and the rest). */
const WATER: readonly ArgumentDeclaration[] = [
  optional(
    "carbonate",
    "Total dissolved inorganic carbon in mol/kg (REDOX.DIC gives it from alkalinity); blank = none. Carbonate, chloride, sulfur and phosphate are treated at fixed totals, exactly at the point: carbonate by its α-fractions at the pH, sulfur over sulfate, sulfide and elemental sulfur at the pH and potential, chloride free.",
  ),
  optional("chloride", "Total chloride in mol/kg; blank = none."),
  optional(
    "sulfur",
    "Total dissolved sulfur (sulfate + sulfide) in mol/kg; blank = none. Sulfur is redox-active: sulfate in oxidising water, elemental sulfur or sulfide in reducing water.",
  ),
  optional(
    "phosphate",
    "Total orthophosphate in mol/kg as P (1 mg/L as PO4 = 1.05E-5); blank = none. Speciated exactly over H3PO4, H2PO4-, HPO4 2- and PO4 3- at the pH; forms lead, copper, zinc, iron and aluminium phosphates.",
  ),
  optional(
    "ionicStrength",
    "Ionic strength in mol/kg, 0 to 0.5 (REDOX.IONICSTRENGTH estimates it from conductivity or TDS); blank = ideal dilute solution. Activity coefficients of charged species by the Davies equation.",
  ),
];

/** ASSESS states the water arguments briefly: the long notes are SPECIES'. */
const WATER_BRIEF: readonly ArgumentDeclaration[] = [
  optional(
    "carbonate",
    "Total dissolved inorganic carbon in mol/kg (REDOX.DIC gives it from alkalinity); blank = none.",
  ),
  optional("chloride", "Total chloride in mol/kg; blank = none."),
  optional("sulfur", "Total dissolved sulfur (sulfate + sulfide) in mol/kg; blank = none."),
  optional("phosphate", "Total orthophosphate in mol/kg as P (1 mg/L as PO4 = 1.05E-5); blank = none."),
  optional(
    "ionicStrength",
    "Ionic strength in mol/kg, 0 to 0.5 (REDOX.IONICSTRENGTH estimates it); blank = ideal dilute solution.",
  ),
];

/** REGIME and BOUNDARY: a metal at a point, with the activity that decides the dominant species, in a water. */
const POINT_IN_WATER: readonly ArgumentDeclaration[] = [
  METAL,
  PH,
  POTENTIAL,
  optional("temperature", TEMPERATURE),
  ACTIVITY,
  ...WATER,
];

const WATER_FUNCTIONS: readonly WorksheetFunctionDeclaration[] = [
  {
    id: "WATERLINE",
    description:
      'Potential of a water stability line, V vs SHE: the O2/H2O line (gas "O2", default) above which water is oxidised to oxygen, or the H+/H2 line (gas "H2") below which it is reduced to hydrogen.',
    parameters: [
      SOLUTION_PH,
      optional("temperature", WATER_TEMPERATURE),
      optional("gas", '"O2" for the oxygen line (default) or "H2" for the hydrogen line.'),
      optional("pressure", "Partial pressure of the gas in bar, above 0 (default 1)."),
    ],
    returns: "Potential in V vs SHE.",
    implementation: ["water-functions", "waterLineAt"],
  },
  {
    id: "WATERMARGIN",
    description:
      "Signed distance in V of a potential from the water stability window (both gases at 1 bar): positive inside the window (distance to the nearer line), negative outside (how far beyond the line crossed).",
    parameters: [
      SOLUTION_PH,
      required("potential", "Potential in V vs SHE, −3 to +3."),
      optional("temperature", WATER_TEMPERATURE),
      optional(
        "overpotential",
        "Extra width in V added beyond each line, 0 or more (default 0; about 0.6 V describes where water decomposes in practice).",
      ),
    ],
    returns: "Margin in V.",
    implementation: ["water-functions", "waterMarginAt"],
  },
  {
    id: "TOSHE",
    description: "Converts a reading against a reference electrode to the standard hydrogen scale (V vs SHE).",
    parameters: [
      required("reading", 'Measured potential against the reference electrode, in V (or mV with unit "mV").'),
      required("electrode", `Reference electrode: ${ELECTRODE_NAMES}.`),
      optional("temperature", ELECTRODE_TEMPERATURE),
      optional("pH", `pH of the solution, ${PH_RANGE}; needed only for RHE.`),
      optional("unit", 'Unit of the reading: "V" (default) or "mV". The result is always in V vs SHE.'),
    ],
    returns: "Potential in V vs SHE.",
    implementation: ["electrode-functions", "toSHEAt"],
  },
  {
    id: "FROMSHE",
    description: "Converts a potential on the standard hydrogen scale to the reading against a reference electrode.",
    parameters: [
      required("potential", "Potential in V vs SHE, −3 to +3."),
      required("electrode", `Reference electrode: ${ELECTRODE_NAMES}.`),
      optional("temperature", ELECTRODE_TEMPERATURE),
      optional("pH", `pH of the solution, ${PH_RANGE}; needed only for RHE.`),
      optional("unit", 'Unit of the result: "V" (default) or "mV".'),
    ],
    returns: "The reading against the electrode, in V or mV.",
    implementation: ["electrode-functions", "fromSHEAt"],
  },
  {
    id: "PE",
    description: "Converts a potential (Eh, V vs SHE) to pe = F·Eh / (RT ln10).",
    parameters: [required("potential", "Potential in V vs SHE."), optional("temperature", WATER_TEMPERATURE)],
    returns: "pe (dimensionless).",
    implementation: ["water-functions", "peAt"],
  },
  {
    id: "EH",
    description: "Converts pe to a potential (Eh, V vs SHE) = pe·RT ln10 / F.",
    parameters: [required("pe", "pe (dimensionless)."), optional("temperature", WATER_TEMPERATURE)],
    returns: "Potential in V vs SHE.",
    implementation: ["water-functions", "ehAt"],
  },
  {
    id: "NEUTRALPH",
    description: "pH of pure water, ½ pKw, at the temperature (7.00 at 25 °C).",
    parameters: [optional("temperature", WATER_TEMPERATURE)],
    returns: "Neutral pH.",
    implementation: ["water-functions", "neutralPHAt"],
  },
  {
    id: "SLOPE",
    description: "Nernst slope RT ln10 / F in V per decade (0.05916 V at 25 °C).",
    parameters: [optional("temperature", WATER_TEMPERATURE)],
    returns: "Slope in V per decade.",
    implementation: ["water-functions", "slopeAt"],
  },
];

const POINT_FUNCTIONS: readonly WorksheetFunctionDeclaration[] = [
  {
    id: "SPECIES",
    description:
      "Dominant (thermodynamically stable) form of a metal at a pH and potential, e.g. Fe2O3(s), Cu2+, Zn(s), and with ligands PbCO3(s), Cu2S(s). Thermodynamics only: what can form, not how fast.",
    parameters: [
      required("element", `Element symbol or name: ${ELEMENT_NAMES}.`),
      PH,
      required(
        "potential",
        "Potential in volts vs SHE, −3 to +3 (convert meter readings, also in mV, with REDOX.TOSHE).",
      ),
      optional("temperature", TEMPERATURE),
      optional(
        "activity",
        `Activity of dissolved metal species, above 0 and at most ${MAX_ACTIVITY}. ${ACTIVITY_DEFAULT}`,
      ),
      ...WATER,
    ],
    returns: "Formula of the dominant species.",
    implementation: ["stability-functions", "speciesAt"],
  },
  {
    id: "REGIME",
    description:
      "Corrosion regime at a pH and potential: immunity (the metal is stable), passivation (a solid compound is stable) or corrosion (a dissolved species is stable).",
    parameters: POINT_IN_WATER,
    returns: "immunity, passivation or corrosion.",
    implementation: ["stability-functions", "regimeAt"],
  },
  {
    id: "BOUNDARY",
    description:
      "Potential (V vs SHE) of the nearest stability boundary above or below the point at its pH; #N/A when none lies between -3 and +3 V.",
    parameters: [...POINT_IN_WATER, optional("direction", "1 for the boundary above (default), -1 for the one below.")],
    returns: "Potential of the boundary in volts vs SHE.",
    implementation: ["stability-functions", "boundaryFrom"],
  },
  {
    id: "COUPLE",
    description:
      "Equilibrium potential (V vs SHE) of the half-reaction between two species, balanced automatically with H2O, H+ and electrons; #N/A when both have the same oxidation state.",
    parameters: [
      required("oxidized", "Formula of the oxidized species, e.g. Fe3+ or Fe2O3(s)."),
      required("reduced", "Formula of the reduced species, e.g. Fe2+ or Fe(s)."),
      PH,
      optional("temperature", TEMPERATURE),
      optional("activity", `Activity of the dissolved species. ${ACTIVITY_DEFAULT}`),
    ],
    returns: "Equilibrium potential in volts vs SHE.",
    implementation: ["stability-functions", "coupleAt"],
  },
  {
    id: "DISSOLVED",
    description:
      "Total dissolved metal (free ion, hydroxo, carbonato and chloro complexes), lead and copper phosphates included, in equilibrium with the controlling solid: the solid, the metal included, that is most stable at the point. A number wherever a solid can form; #N/A where even the most stable solid would dissolve (more than 1 mol/kg). Does not depend on a threshold activity. A thermodynamic estimate, not a substitute for laboratory analysis of lead or copper in drinking water.",
    parameters: [
      METAL,
      PH,
      POTENTIAL,
      optional("temperature", TEMPERATURE),
      ...WATER,
      optional("unit", "mol/kg (default), mg/L or ug/L."),
    ],
    returns: "Dissolved metal in the chosen unit.",
    implementation: ["stability-functions", "dissolvedAt"],
  },
  {
    id: "IONICSTRENGTH",
    description:
      "Ionic strength in mol/kg estimated from specific conductance (I ≈ 1.6E-5 × µS/cm, Russell 1976) or total dissolved solids (I ≈ 2.5E-5 × mg/L, Langelier 1936), for the ionicStrength argument. Empirical, about ±30 % in fresh waters.",
    parameters: [
      required("value", "Specific conductance in µS/cm at 25 °C, or TDS in mg/L."),
      required("basis", '"uS/cm" (conductance) or "mg/L" (TDS).'),
    ],
    returns: "Ionic strength in mol/kg.",
    implementation: ["ionic-strength-functions", "ionicStrengthAt"],
  },
  {
    id: "SPECIESTABLE",
    description:
      "Table of a metal's species with a header row: formula, state, name, Gibbs energy of formation at the temperature (kJ/mol) and data source.",
    parameters: [METAL, optional("temperature", TEMPERATURE)],
    returns: "The table; it spills.",
    implementation: ["stability-functions", "speciesTable"],
  },
  {
    id: "DIC",
    description:
      "Total dissolved inorganic carbon (mol/kg) from total alkalinity (or bicarbonate) and pH, for the carbonate argument of SPECIES, REGIME, BOUNDARY and DISSOLVED. Carbonic acid constants and their temperature dependence from Plummer & Busenberg (1982); ideal dilute water (activity coefficients 1, mg/L taken per kg); other bases (borate, silicate, phosphate, organics) counted as carbonate. #N/A below the alkalinity end point (pH 4.5), where alkalinity does not determine DIC, and for bicarbonate where it is under a thousandth of the carbonate.",
    parameters: [
      required(
        "alkalinity",
        'Total alkalinity in mg/L as CaCO3, 0 or more (with basis "bicarbonate": bicarbonate in mg/L as HCO3−).',
      ),
      PH,
      optional("temperature", TEMPERATURE),
      optional(
        "basis",
        '"alkalinity" (the default) or "bicarbonate": what the first argument is. DIC = bicarbonate / α1 at the pH.',
      ),
    ],
    returns: "Dissolved inorganic carbon in mol/kg.",
    implementation: ["carbonate-functions", "dicAt"],
  },
  {
    id: "ASSESS",
    description:
      "One row per sample: dominant species, regime, nearest boundary above and below (V vs SHE), water margin (V), equilibrium dissolved metal and the solid controlling it — what SPECIES, REGIME, BOUNDARY, WATERMARGIN and DISSOLVED give for that row. Give single cells or columns; the answer spills. Thermodynamics only: what can form, not how fast.",
    parameters: [
      required("element", "Metal symbol or name (REDOX.METALS lists them)."),
      PH,
      required("potential", "Potential in volts vs SHE, −3 to +3 (convert meter readings with REDOX.TOSHE)."),
      optional(
        "temperature",
        `Temperature in °C, ${CELSIUS_RANGE} (${PRESSURE_NOTE}). Default ${DEFAULT_CELSIUS}; a blank cell is a missing measurement.`,
      ),
      optional("activity", `Activity of dissolved metal species deciding the dominant species. ${ACTIVITY_DEFAULT}`),
      ...WATER_BRIEF,
      optional("unit", "Unit of the dissolved metal: mol/kg (default), mg/L or ug/L."),
      optional("header", "TRUE for a header row above the answers."),
    ],
    returns: "Seven columns per sample row.",
    implementation: ["assess-functions", "assessAt"],
  },
];

const LIST_FUNCTIONS: readonly WorksheetFunctionDeclaration[] = [
  {
    id: "METALS",
    description: "The supported metals by symbol, one per row (for a Data Validation list).",
    parameters: [],
    returns: "Metal symbols; the list spills down.",
    implementation: ["list-functions", "metalList"],
  },
  {
    id: "ELECTRODES",
    description: "The reference electrode names the conversions accept, one per row (for a Data Validation list).",
    parameters: [],
    returns: "Electrode names; the list spills down.",
    implementation: ["list-functions", "electrodeList"],
  },
  {
    id: "VERSION",
    description:
      "The add-in version and a fingerprint of the thermodynamic and electrode data it answers from, for audit trails.",
    parameters: [],
    returns: "Two rows: add-in and data.",
    implementation: ["list-functions", "versionTable"],
  },
];

/** Every worksheet function, in the order functions.ts declares and associates them. */
export const WORKSHEET_FUNCTIONS: readonly WorksheetFunctionDeclaration[] = [
  ...WATER_FUNCTIONS,
  ...POINT_FUNCTIONS,
  ...LIST_FUNCTIONS,
];
