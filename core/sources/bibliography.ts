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
  // Engineering-grade substance library: handbooks, compilations and reference-EOS papers.
  // DOIs and ISBNs marked "from memory" were written down without access to the publisher's page.
  {
    id: "vdi-heat-atlas-2010",
    short: "VDI Heat Atlas (2010), D3.1",
    reference:
      "VDI e.V. (ed.), VDI Heat Atlas, 2nd ed., Springer, Berlin Heidelberg, 2010; part D3.1, " +
      "M. Kleiber, R. Joh, Liquids and Gases: Properties of Pure Fluid Substances (saturation " +
      "tables; PPDS equations for vapour pressure and enthalpy of vaporization)",
    // DOI from memory.
    locator: "doi:10.1007/978-3-540-77877-6",
  },
  {
    id: "poling-2001",
    short: "Poling et al. (2001), App. A",
    reference:
      "B. E. Poling, J. M. Prausnitz, J. P. O'Connell, The Properties of Gases and Liquids, 5th " +
      "ed., McGraw-Hill, New York, 2001; Appendix A (critical constants, Wagner and Antoine " +
      "vapour-pressure constants, ideal-gas heat-capacity polynomials)",
    // ISBN from memory.
    locator: "ISBN 0-07-011682-2",
  },
  {
    id: "crc-handbook-95",
    short: "CRC Handbook, 95th ed. (2014)",
    reference:
      "W. M. Haynes, T. J. Bruno, D. R. Lide (eds.), CRC Handbook of Chemistry and Physics, 95th " +
      "ed., CRC Press, Boca Raton, FL, 2014 (tables of physical constants of organic and " +
      "inorganic compounds, enthalpy of fusion, enthalpy of vaporization)",
    // ISBN from memory.
    locator: "ISBN 978-1-4822-0867-2",
  },
  {
    id: "staveley-1981",
    short: "Staveley et al. (1981)",
    reference:
      "L. A. K. Staveley, L. Q. Lobo, J. C. G. Calado, Triple-points of low melting substances " +
      "and their use in cryogenic work, Cryogenics 21, 131-144 (1981); temperatures on ITS-90",
    // DOI from memory.
    locator: "doi:10.1016/0011-2275(81)90264-2",
  },
  {
    id: "perry-2008",
    short: "Perry's Handbook, 8th ed. (2008)",
    reference:
      "D. W. Green, R. H. Perry (eds.), Perry's Chemical Engineers' Handbook, 8th ed., " +
      "McGraw-Hill, New York, 2008; Section 2, Table 2-8 (vapour pressure, DIPPR Eq. 101) and " +
      "Table 2-153 (heat capacity of liquids)",
    // ISBN from memory.
    locator: "ISBN 978-0-07-142294-9",
  },
  {
    id: "mathews-1972",
    short: "Mathews (1972)",
    reference:
      "J. F. Mathews, The critical constants of inorganic substances, Chem. Rev. 72, 71-100 (1972)",
    // DOI from memory.
    locator: "doi:10.1021/cr60275a004",
  },
  {
    id: "iupac-atomic-weights-2007",
    short: "IUPAC atomic weights 2007",
    reference:
      "M. E. Wieser, M. Berglund, Atomic weights of the elements 2007 (IUPAC Technical Report), " +
      "Pure Appl. Chem. 81, 2131-2156 (2009)",
    // DOI from memory.
    locator: "doi:10.1351/PAC-REP-09-08-03",
  },
  {
    id: "span-2000-nitrogen",
    short: "Span et al. (2000), nitrogen",
    reference:
      "R. Span, E. W. Lemmon, R. T. Jacobsen, W. Wagner, A. Yokozeki, A reference equation of " +
      "state for the thermodynamic properties of nitrogen for temperatures from 63.151 to 1000 K " +
      "and pressures to 2200 MPa, J. Phys. Chem. Ref. Data 29, 1361-1433 (2000)",
    // DOI from memory.
    locator: "doi:10.1063/1.1349047",
  },
  {
    id: "tegeler-1999-argon",
    short: "Tegeler et al. (1999), argon",
    reference:
      "Ch. Tegeler, R. Span, W. Wagner, A new equation of state for argon covering the fluid " +
      "region for temperatures from the melting line to 700 K at pressures up to 1000 MPa, " +
      "J. Phys. Chem. Ref. Data 28, 779-850 (1999)",
    // DOI from memory.
    locator: "doi:10.1063/1.556037",
  },
  {
    id: "leachman-2009-hydrogen",
    short: "Leachman et al. (2009), hydrogen",
    reference:
      "J. W. Leachman, R. T. Jacobsen, S. G. Penoncello, E. W. Lemmon, Fundamental equations of " +
      "state for parahydrogen, normal hydrogen, and orthohydrogen, J. Phys. Chem. Ref. Data 38, " +
      "721-748 (2009)",
    // DOI from memory.
    locator: "doi:10.1063/1.3160306",
  },
  {
    id: "tillner-roth-1994-r134a",
    short: "Tillner-Roth & Baehr (1994), R-134a",
    reference:
      "R. Tillner-Roth, H. D. Baehr, An international standard formulation for the " +
      "thermodynamic properties of 1,1,1,2-tetrafluoroethane (HFC-134a) for temperatures from " +
      "170 K to 455 K and pressures up to 70 MPa, J. Phys. Chem. Ref. Data 23, 657-729 (1994)",
    // DOI from memory.
    locator: "doi:10.1063/1.555958",
  },
  {
    id: "nist-janaf-1998",
    short: "NIST-JANAF (1998)",
    reference:
      "M. W. Chase Jr., NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref. Data " +
      "Monograph 9 (1998)",
    locator: "J. Phys. Chem. Ref. Data Monograph 9",
  },
  {
    id: "peng-robinson-1976",
    short: "Peng & Robinson (1976)",
    reference:
      "D.-Y. Peng, D. B. Robinson, A new two-constant equation of state, Ind. Eng. Chem. " +
      "Fundam. 15, 59-64 (1976)",
    // DOI from memory.
    locator: "doi:10.1021/i160057a011",
  },
  {
    id: "watson-1943",
    short: "Watson (1943)",
    reference:
      "K. M. Watson, Thermodynamics of the liquid state, Ind. Eng. Chem. 35, 398-406 (1943); " +
      "the temperature scaling of the enthalpy of vaporization as given by Poling et al., The " +
      "Properties of Gases and Liquids, 5th ed. (2001), Eq. (7-12.1)",
    // DOI from memory.
    locator: "doi:10.1021/ie50400a004",
  },
  {
    id: "pitzer-1955",
    short: "Pitzer et al. (1955)",
    reference:
      "K. S. Pitzer, D. Z. Lippmann, R. F. Curl, C. M. Huggins, D. E. Petersen, The volumetric " +
      "and thermodynamic properties of fluids. II. Compressibility factor, vapor pressure and " +
      "entropy of vaporization, J. Am. Chem. Soc. 77, 3433-3440 (1955) (acentric factor)",
    // DOI from memory.
    locator: "doi:10.1021/ja01618a002",
  },
  {
    id: "si-brochure-2019",
    short: "SI Brochure (2019)",
    reference:
      "BIPM, The International System of Units (SI), 9th ed., 2019: the Avogadro and Boltzmann " +
      "constants are exact, so the molar gas constant R = N_A k = 8.314 462 618 ... J/(mol K) " +
      "is exact",
    locator: "BIPM SI Brochure, 9th ed. (2019)",
  },
  // Carbon dioxide at reference grade.
  {
    id: "span-wagner-1996",
    short: "Span & Wagner (1996)",
    reference:
      "R. Span, W. Wagner, A New Equation of State for Carbon Dioxide Covering the Fluid Region " +
      "from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa, J. Phys. Chem. " +
      "Ref. Data 25, 1509-1596 (1996)",
    locator: "doi:10.1063/1.555991",
  },
  {
    id: "jager-span-2012",
    short: "Jäger & Span (2012)",
    reference:
      "A. Jäger, R. Span, Equation of State for Solid Carbon Dioxide Based on the Gibbs Free " +
      "Energy, J. Chem. Eng. Data 57, 590-597 (2012)",
    locator: "doi:10.1021/je2011677",
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
