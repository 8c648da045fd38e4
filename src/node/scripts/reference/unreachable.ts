/**
 * Why the records still marked `fromMemory` cannot be checked from anything
 * this project can reach: one entry per data table that holds such records.
 * Printed by `npm run provenance` into docs/provenance.md, under the heading
 * "What no reachable copy can check"; tests/data/reference-crosscheck.test.ts fails when a table with
 * records from memory has no entry here, so the report never goes silent on one.
 *
 * Reachable means: the package registries of the machine (npm and Debian; PyPI
 * answers no, so PyPI packages not already installed, such as mendeleev, are out
 * of reach), the PHREEQC databases under ../shared/reference/phreeqc/, and the
 * text of public repositories and pages that the project's search tool holds.
 *
 * @module
 */

/**
 * Table file name → why its remaining records from memory have no open copy to
 * be compared with. A table may have an entry before it holds such records (new
 * ions or salts entered from memory land in these tables); the report shows an
 * entry only while its table holds records from memory.
 */
export const UNREACHABLE: Record<string, string> = {
  'ion-formation-aq.json':
    'NBS aqueous-ion enthalpies of formation of ions that the CRC aqueous-ion copy does not list; the NBS tables themselves are in no reachable package.',
  'ion-heat-capacities-aq.json': 'NBS partial molar heat capacities of aqueous ions that the CRC aqueous-ion copy does not list.',
  'ions.json': 'ions whose composition and charge no copy lists as an aqueous ion, a crystalline substance or a Shannon entry.',
  'thermochemical-radii.json':
    'Roobottom, Jenkins, Passmore and Glasser (1999): no reachable package carries thermochemical radii (chemicals, pymatgen and the PHREEQC databases do not); the one public copy found, the CRC lattice-energy table, was read for NH4+ only.',
  'ion-volumes.json':
    'Jenkins et al. (1999) ion volumes: in no reachable package; the open-access follow-up that tabulates such volumes (Housecroft and Jenkins 2017, RSC Advances, CC BY 3.0) is held by the search tool only as its first page, without its tables.',
  'volume-coefficients.json': 'Jenkins et al. (1999) and Glasser and Jenkins (2000) fit coefficients: in no reachable package or stored text.',
  'hazards.json':
    'CLP Annex VI (table 3) is published by ECHA as a spreadsheet; no npm, Debian or installed PyPI package carries it, and the one repository copy found holds only the spreadsheets, which are binary and cannot be read here. The annexes of Regulation (EU) 2019/1148 and REACH, and supplier safety data sheets, have no open machine-readable copy either. Every hazard class therefore stays from memory, and the results say so beside each class.',
  'warmer-melts.json':
    "melting points, latent heats and melt heat capacities of salt hydrates (Lane 1983, Abhat 1983, Zalba et al. 2003): the CRC tables carried by chemicals give no melting point for these hydrates and heats of fusion only for anhydrous salts; no other reachable package carries phase-change-material data. Two solid heat capacities could be compared with Perry's table.",
  'compound-formation.json':
    'NBS (Wagman et al. 1982) formation enthalpies of these hydrates and salts: the CRC copy does not list them and llnl.dat lists them without a formation enthalpy (for example antarcticite and bischofite); the NBS tables themselves are in no reachable package.',
  'crystals.json':
    'the CRC copies have no density for Zn(NO3)2·6H2O, KAl(SO4)2·12H2O, NiCl2·6H2O and xylitol, and carry ZnS as wurtzite only (the record is sphalerite); RbF, CuBr and SrO hold a structure type and lattice parameter (Wyckoff 1963, in no reachable copy) and no density.',
  'heat-capacities.json': 'NBS heat capacities of MgCl2·4H2O, Na2CO3·H2O, Na2CO3·10H2O and urea: in none of the CRC, JANAF or Perry copies.',
  'hydration-enthalpies.json':
    "Marcus's proton value (the scale itself); ions whose gas-phase enthalpy no copy gives (ClO4−, HS−, CH3COO−; Sn2+, since no copy has gaseous tin); and I−, which has no gaseous-ion record to close the cycle with (the comparison builds the atom cycle for cations only). Marcus's printed table is in no reachable copy.",
  'ion-formation-gas.json':
    'lattice-energy estimates of the unbound O2− and S2− (Jenkins 1999), and HS− and CH3COO− derived from gas-phase acidities and electron affinities that no reachable copy tabulates.',
  'shannon-radii.json': "OH− (Shannon lists it beside the monatomic anions), Sn2+ at CN 8 and a commonly quoted NH4+ radius: pymatgen's copy of the Shannon table is by element and carries none of them.",
  'atomization-enthalpies.json': 'ΔfH°(Sn, g): the CRC copy carries grey tin only, and ATcT 1.112 has no tin.',
  'brine-pitzer.json': 'Pitzer and Mayorga (1973) NH4Cl and NH4NO3 parameters: pitzer.dat has no ammonium species, and no other reachable package carries them.',
  'solubility.json':
    'the solubility of urea (Seidell 1941): the CRC aqueous-solubility copy covers inorganic compounds only; nor does that copy give the salt–water eutectics nested in the records, since its curves start at 0 °C.',
  'solution-enthalpies.json': 'KF·2H2O, KOCN and urea: the CRC copies cannot close the cycle for them and llnl.dat has no plain dissolution of them.',
};
