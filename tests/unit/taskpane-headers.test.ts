import { describe, expect, it } from "vitest";
import { findHeaderRow, headerTokens, matchHeaders } from "../../src/tables";
import { parseDelimited } from "../../src/tables";

describe("header matching on realistic spellings", () => {
  it("the invented demo log's header (snake case with units and electrode)", () => {
    const headers =
      "site,pipe_material,pipe_metal,sample_id,date,pH,ORP_mV_AgCl_sat,temp_C,alkalinity_mg_L_CaCO3,Fe_ug_L,Cu_ug_L,Pb_ug_L,note".split(
        ",",
      );
    const { mapping, hints } = matchHeaders(headers, "Pb", "lead");
    expect(mapping).toEqual({ pH: 5, potential: 6, temperature: 7, dissolved: 11, metal: 2, id: 3, site: 0 });
    expect(hints).toEqual({
      potentialUnit: "mV",
      electrode: "AgCl-sat",
      temperatureUnit: "C",
      temperatureScale: "C",
      dissolvedUnit: "ug/L",
    });
  });

  it("a field sheet with spaces, brackets and symbols", () => {
    const headers = [
      "Sample ID",
      "Location",
      "Date",
      "Temperature (°C)",
      "pH (field)",
      "ORP (mV)",
      "Dissolved iron (mg/L)",
    ];
    const { mapping, hints } = matchHeaders(headers, "Fe", "iron");
    expect(mapping).toMatchObject({ id: 0, site: 1, temperature: 3, pH: 4, potential: 5, dissolved: 6, metal: -1 });
    expect(hints.potentialUnit).toBe("mV");
    expect(hints.electrode).toBeNull();
    expect(hints.dissolvedUnit).toBe("mg/L");
  });

  it("laboratory spellings: Eh in volts, T (C), °C alone", () => {
    expect(matchHeaders(["ID", "T (C)", "pH", "Eh (V)"])).toMatchObject({
      mapping: { id: 0, temperature: 1, pH: 2, potential: 3 },
      hints: { potentialUnit: "V", electrode: "SHE", temperatureUnit: "C" },
    });
    expect(matchHeaders(["pH", "E vs SCE / V", "°C"])).toMatchObject({
      mapping: { pH: 0, potential: 1, temperature: 2 },
      hints: { potentialUnit: "V", electrode: "SCE" },
    });
    expect(matchHeaders(["Redox potential [mV] Ag/AgCl 3M", "PH", "Water temp °F"])).toMatchObject({
      mapping: { potential: 0, pH: 1, temperature: 2 },
      hints: { potentialUnit: "mV", electrode: "AgCl-3M", temperatureUnit: "F" },
    });
    expect(matchHeaders(["Temp", "pH", "mV"]).mapping).toMatchObject({ temperature: 0, pH: 1, potential: 2 });
  });

  it("does not mistake look-alikes", () => {
    // phosphate is not pH; "E. coli" is not a potential; date is not an id
    const { mapping } = matchHeaders(["Phosphate (mg/L)", "E. coli (cfu)", "Date", "pH", "ORP"]);
    expect(mapping.pH).toBe(3);
    expect(mapping.potential).toBe(4);
    expect(mapping.id).toBe(-1);
    expect(headerTokens("ORP (mV) vs Ag/AgCl")).toEqual(["orp", "mv", "vs", "ag", "agcl"]);
  });

  it("finds the header row below title lines", () => {
    const rows = [["Quarterly results"], ["", ""], ["Site", "pH", "ORP (mV)"], ["A", 7.1, 320]];
    expect(findHeaderRow(rows)).toBe(2);
    expect(findHeaderRow([["A", 7.1, 320]])).toBe(-1);
  });
});

describe("pasted and opened text", () => {
  it("reads CSV with quotes, comments and CRLF", () => {
    const text = '# invented\r\nsite,pH,ORP\r\n"cast iron, unlined",7.1,320\r\n"say ""hi""",6.5,\r\n';
    const parsed = parseDelimited(text);
    expect(parsed.delimiter).toBe(",");
    expect(parsed.comments).toEqual(["# invented"]);
    expect(parsed.rows).toEqual([
      ["site", "pH", "ORP"],
      ["cast iron, unlined", "7.1", "320"],
      ['say "hi"', "6.5", ""],
    ]);
    expect(parsed.lines).toEqual([2, 3, 4]);
  });
  it("reads TSV copied from a spreadsheet and semicolon CSV", () => {
    expect(parseDelimited("pH\tORP\n7.2\t410\n").rows).toEqual([
      ["pH", "ORP"],
      ["7.2", "410"],
    ]);
    expect(parseDelimited("pH;ORP\n7,2;410").rows).toEqual([
      ["pH", "ORP"],
      ["7,2", "410"],
    ]);
  });
});
