/**
 * The project's sources in one place: key → full citation. `data/fluids.ts` (`source`),
 * `rules/` and the tests refer to a source by its key; each reference equation of state has
 * exactly one entry here. Keys of the reference equations are the bibliography keys of the
 * data files the constants and reference tables were read from (test/reference/README.md).
 */

export interface Source {
  /** Full citation: authors, year, title, journal, volume, pages, doi where known. */
  readonly citation: string;
  /** What the project takes from it. */
  readonly use: string;
}

const EOS = 'reference equation of state: constants (data/fluids.ts) and reference tables';

export const SOURCES: Readonly<Record<string, Source>> = {
  'Lemmon-JCED-2009': {
    citation:
      'E.W. Lemmon, M.O. McLinden, W. Wagner (2009), Thermodynamic Properties of Propane. III. A Reference Equation of State for Temperatures from the Melting Line to 650 K and Pressures up to 1000 MPa, J. Chem. Eng. Data 54, 3141–3180, doi:10.1021/je900217v',
    use: `propane ${EOS}`,
  },
  'Buecker-JPCRD-2006B': {
    citation:
      'D. Bücker, W. Wagner (2006), Reference Equations of State for the Thermodynamic Properties of Fluid Phase n-Butane and Isobutane, J. Phys. Chem. Ref. Data 35, 929–1019, doi:10.1063/1.1901687',
    use: `n-butane and isobutane ${EOS}`,
  },
  'Lemmon-PROPYLENE-2013': {
    citation:
      'E.W. Lemmon, U. Overhoff, M.O. McLinden, W. Wagner (2010), Equation of state for propylene, unpublished manuscript, as distributed with its data file',
    use: `propylene ${EOS}`,
  },
  'Buecker-JPCRD-2006': {
    citation:
      'D. Bücker, W. Wagner (2006), A Reference Equation of State for the Thermodynamic Properties of Ethane for Temperatures from the Melting Line to 675 K and Pressures up to 900 MPa, J. Phys. Chem. Ref. Data 35, 205–266, doi:10.1063/1.1859286',
    use: `ethane ${EOS}`,
  },
  // Distributed under the bibliography key of its 2020 preprint; published in 2023.
  'Gao-JPCRD-2020': {
    citation:
      'K. Gao, J. Wu, I.H. Bell, A.H. Harvey, E.W. Lemmon (2023), Reference Equation of State with an Associating Term for the Thermodynamic Properties of Ammonia, J. Phys. Chem. Ref. Data 52, 013102',
    use: `ammonia ${EOS}`,
  },
  'Span-JPCRD-1996': {
    citation:
      'R. Span, W. Wagner (1996), A New Equation of State for Carbon Dioxide Covering the Fluid Region from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa, J. Phys. Chem. Ref. Data 25, 1509–1596, doi:10.1063/1.555991',
    use: `carbon dioxide ${EOS}`,
  },
  'Wu-JPCRD-2011': {
    citation:
      'J. Wu, Y. Zhou, E.W. Lemmon (2011), An Equation of State for the Thermodynamic Properties of Dimethyl Ether, J. Phys. Chem. Ref. Data 40, 023104, doi:10.1063/1.3582533',
    use: `dimethyl ether ${EOS}`,
  },
  'TillnerRoth-JPCRD-1994': {
    citation:
      'R. Tillner-Roth, H.D. Baehr (1994), An International Standard Formulation for the Thermodynamic Properties of 1,1,1,2-Tetrafluoroethane (HFC-134a) for Temperatures from 170 K to 455 K and Pressures up to 70 MPa, J. Phys. Chem. Ref. Data 23, 657–729, doi:10.1063/1.555958',
    use: `R-134a ${EOS}`,
  },
  'TillnerRoth-JPCRD-1997': {
    citation:
      'R. Tillner-Roth, A. Yokozeki (1997), An International Standard Equation of State for Difluoromethane (R-32) for Temperatures from the Triple Point at 136.34 K to 435 K and Pressures up to 70 MPa, J. Phys. Chem. Ref. Data 26, 1273–1328, doi:10.1063/1.556002',
    use: `R-32 ${EOS}`,
  },
  'Lemmon-JPCRD-2005': {
    citation:
      'E.W. Lemmon, R.T. Jacobsen (2005), A New Functional Form and New Fitting Techniques for Equations of State with Application to Pentafluoroethane (HFC-125), J. Phys. Chem. Ref. Data 34, 69–108, doi:10.1063/1.1797813',
    use: `R-125 ${EOS}`,
  },
  'LemmonJacobsen-JPCRD-2000': {
    citation:
      'E.W. Lemmon, R.T. Jacobsen (2000), An International Standard Formulation for the Thermodynamic Properties of 1,1,1-Trifluoroethane (HFC-143a) for Temperatures from 161 to 450 K and Pressures to 50 MPa, J. Phys. Chem. Ref. Data 29, 521–552, doi:10.1063/1.1318909',
    use: `R-143a ${EOS}`,
  },
  'Lemmon-IJT-2022': {
    citation:
      'E.W. Lemmon, R. Akasaka (2022), Equation of State for the Thermodynamic Properties of 2,3,3,3-Tetrafluoroprop-1-ene (R1234yf), Int. J. Thermophys. 43, 119, doi:10.1007/s10765-022-03015-y',
    use: `R-1234yf ${EOS}`,
  },
  'Thol-IJT-2016-R1234zeE': {
    citation:
      'M. Thol, E.W. Lemmon (2016), Equation of State for the Thermodynamic Properties of trans-1,3,3,3-Tetrafluoropropene [R-1234ze(E)], Int. J. Thermophys. 37, doi:10.1007/s10765-016-2040-6',
    use: `R-1234ze(E) ${EOS}`,
  },
  'Kamei-IJT-1995': {
    citation:
      'A. Kamei, S.W. Beyerlein, R.T. Jacobsen (1995), Application of Nonlinear Regression in the Development of a Wide Range Formulation for HCFC-22, Int. J. Thermophys. 16, 1155–1164, doi:10.1007/BF02081283',
    use: `R-22 ${EOS}`,
  },
  'Lemmon-JCED-2006': {
    citation:
      'E.W. Lemmon, R. Span (2006), Short Fundamental Equations of State for 20 Industrial Fluids, J. Chem. Eng. Data 51, 785–850, doi:10.1021/je050186n',
    use: `nitrous oxide ${EOS}`,
  },
  'Gao-JCED-2016': {
    citation:
      'K. Gao, J. Wu, P. Zhang, E.W. Lemmon (2016), A Helmholtz Energy Equation of State for Sulfur Dioxide, J. Chem. Eng. Data 61, 2859–2872, doi:10.1021/acs.jced.6b00195',
    use: `sulfur dioxide ${EOS}`,
  },
  'Thol-AICHE-2021': {
    citation:
      'M. Thol, S. Herrig, R. Span, E.W. Lemmon (2021), A Fundamental Equation of State for the Calculation of Thermodynamic Properties of Chlorine, AIChE J. 67, e17326, doi:10.1002/aic.17326',
    use: `chlorine ${EOS}`,
  },
  'Lemmon-FPE-2005': {
    citation:
      'E.W. Lemmon, E.C. Ihmels (2005), Thermodynamic Properties of the Butenes. Part II. Short Fundamental Equations of State, Fluid Phase Equilib. 228–229, 173–187, doi:10.1016/j.fluid.2004.09.004',
    use: `1-butene and isobutene ${EOS}`,
  },
  'Thol-FPE-2019-alkanes-pentane': {
    citation:
      'M. Thol, T. Uhde, E.W. Lemmon, R. Span (2019), Fundamental Equations of State for Hydrocarbons. Part I. n-Pentane, Fluid Phase Equilib.',
    use: `n-pentane ${EOS}`,
  },
  'Kunz-JCED-2012': {
    citation:
      'O. Kunz, W. Wagner (2012), The GERG-2008 Wide-Range Equation of State for Natural Gases and Other Mixtures, J. Chem. Eng. Data 57, 3032–3091, doi:10.1021/je300655b',
    use: 'LP-gas blend bubble points (test/reference/bubble.csv), the check of k_ij = 0',
  },
  'LemmonJacobsen-JPCRD-2004': {
    citation:
      'E.W. Lemmon, R.T. Jacobsen (2004), Equations of State for Mixtures of R-32, R-125, R-134a, R-143a, and R-152a, J. Phys. Chem. Ref. Data 33, 593–620, doi:10.1063/1.1649997',
    use: 'refrigerant blends R-410A, R-404A, R-407C, R-507A: reference tables (test/reference/blends/)',
  },
  'Bell-JPCRD-2023': {
    citation:
      'I.H. Bell (2023), mixture model for R-32/R-1234yf, J. Phys. Chem. Ref. Data 52, 013101, doi:10.1063/5.0135368',
    use: 'refrigerant blend R-454B: reference tables (test/reference/blends/)',
  },
  'HankinsonThomson-AIChE-1979': {
    citation:
      'R.W. Hankinson, G.H. Thomson (1979), A New Correlation for Saturated Densities of Liquids and Their Mixtures, AIChE J. 25, 653–663, doi:10.1002/aic.690250412',
    use: 'Rackett compressibility Z_RA (data/fluids.ts zRA)',
  },
  'NIST-SP811-2008': {
    citation:
      'A. Thompson, B.N. Taylor (2008), Guide for the Use of the International System of Units (SI), NIST Special Publication 811, Appendix B',
    use: 'exact unit conversion factors (thermo/units.ts)',
  },
  'CFR-29-1910.110': {
    citation:
      '29 CFR 1910.110, Storage and handling of liquefied petroleum gases (2015 edition text)',
    use: 'LP-gas filling densities and relief settings (rules/lpgas.ts, rules/pressure.ts)',
  },
  'CFR-29-1910.111': {
    citation: '29 CFR 1910.111, Storage and handling of anhydrous ammonia (2015 edition text)',
    use: 'ammonia filling densities and design pressures (rules/gases.ts, rules/pressure.ts)',
  },
  'CFR-49-173': {
    citation:
      '49 CFR 173.304a, 173.314, 173.315, Shippers — general requirements for shipments and packagings: liquefied compressed gases (2015 edition text)',
    use: 'filling densities of cylinders and cargo tanks (rules/gases.ts)',
  },
};

/** The full citation for a key; throws for a key that is not in the registry. */
export function citation(key: string): string {
  const s = SOURCES[key];
  if (!s) throw new Error(`no source with key ${key} in thermo/data/sources.ts`);
  return s.citation;
}
