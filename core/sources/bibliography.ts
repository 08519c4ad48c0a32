/**
 * Every publication Phasecell relies on, held once. Everything else points here by id.
 * DOIs marked "from memory" were written down without access to the publisher's page.
 */

/** One publication. */
export interface Citation {
  /** lower-kebab id, stable once shipped. */
  readonly id: string;
  /** Short label for tables, e.g. "IAPWS R14-08(2011)". */
  readonly short: string;
  /** Full reference as a reviewer would write it. */
  readonly reference: string;
  /** DOI or standard number, when there is one. */
  readonly locator?: string;
}

const entries = [
  {
    id: "iapws-if97",
    short: "IAPWS-IF97",
    reference:
      "IAPWS, Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic " +
      "Properties of Water and Steam, Lucerne, Switzerland, August 2007 (IAPWS R7-97(2012)); " +
      "W. Wagner et al., J. Eng. Gas Turbines Power 122, 150-182 (2000)",
    locator: "IAPWS R7-97(2012); doi:10.1115/1.483186",
  },
  {
    id: "iapws-r14-08",
    short: "IAPWS R14-08(2011)",
    reference:
      "IAPWS, Revised Release on the Pressure along the Melting and Sublimation Curves of " +
      "Ordinary Water Substance, IAPWS R14-08(2011); W. Wagner, T. Riethmann, R. Feistel, " +
      "A. H. Harvey, J. Phys. Chem. Ref. Data 40, 043103 (2011)",
    locator: "IAPWS R14-08(2011); doi:10.1063/1.3657937",
  },
  {
    id: "iapws-r10-06",
    short: "IAPWS R10-06(2009)",
    reference:
      "IAPWS, Revised Release on the Equation of State 2006 for H2O Ice Ih, IAPWS R10-06(2009); " +
      "R. Feistel, W. Wagner, J. Phys. Chem. Ref. Data 35, 1021-1047 (2006)",
    locator: "IAPWS R10-06(2009); doi:10.1063/1.2183324",
  },
  {
    id: "iapws-95",
    short: "IAPWS-95",
    reference:
      "IAPWS, Revised Release on the IAPWS Formulation 1995 for the Thermodynamic Properties of " +
      "Ordinary Water Substance for General and Scientific Use, IAPWS R6-95(2018); W. Wagner, " +
      "A. Pruss, J. Phys. Chem. Ref. Data 31, 387-535 (2002)",
    locator: "IAPWS R6-95(2018); doi:10.1063/1.1461829",
  },
  {
    id: "iapws-sr1-86",
    short: "IAPWS SR1-86(1992)",
    reference:
      "IAPWS, Revised Supplementary Release on Saturation Properties of Ordinary Water Substance, " +
      "IAPWS SR1-86(1992); W. Wagner, A. Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993)",
    // DOI from memory.
    locator: "IAPWS SR1-86(1992); doi:10.1063/1.555926",
  },
  {
    id: "its-90",
    short: "ITS-90",
    reference:
      "H. Preston-Thomas, The International Temperature Scale of 1990 (ITS-90), Metrologia 27, " +
      "3-10 (1990)",
    locator: "doi:10.1088/0026-1394/27/1/002",
  },
  {
    id: "nist-sp811",
    short: "NIST SP 811",
    reference:
      "A. Thompson, B. N. Taylor, Guide for the Use of the International System of Units (SI), " +
      "NIST Special Publication 811, 2008 edition, Appendix B (conversion factors)",
    locator: "NIST SP 811 (2008)",
  },
  {
    id: "ashrae-34",
    short: "ANSI/ASHRAE 34",
    reference:
      "ANSI/ASHRAE Standard 34, Designation and Safety Classification of Refrigerants " +
      "(refrigerant numbers)",
    locator: "ANSI/ASHRAE 34",
  },
] as const satisfies readonly Citation[];

/** Citation ids known to the bibliography. */
export type CitationId = (typeof entries)[number]["id"];

const byId: ReadonlyMap<string, Citation> = new Map(entries.map((entry) => [entry.id, entry]));

/** Looks up a citation; ids are checked at compile time, so this never misses. */
export function citation(id: CitationId): Citation {
  const found = byId.get(id);
  if (!found) throw new Error(`unknown citation id ${id}`);
  return found;
}

/** All citations, in the order above. */
export const bibliography: readonly Citation[] = entries;
