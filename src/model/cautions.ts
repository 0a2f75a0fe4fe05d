/**
 * The cautions every view shows: the editor (at first start and from the help menu), the CLI
 * report and every export. One text, so they never drift apart.
 */
export const CAUTIONS: readonly string[] = [
  'Dropline is a design aid. Its results are only as good as the inputs and data it is given.',
  'Local wiring rules, the requirements of the supply company and licensed practice prevail over anything this tool reports.',
  'Every value must be verified on site, by testing, by a competent person before an installation is energised or certified.',
  'Tabulated data built in here are derived from published formulas and standard values; where a licensed table applies, load it as a data set and check the figures against it.',
];

/** Standards and editions the built-in methods and data rely on. */
export const STANDARD_EDITIONS: readonly string[] = [
  'IEC 60228:2004 conductor resistances (Class 1, 2 and 5)',
  'IEC 60364-5-52:2009 Annex G voltage drop method and limits',
  'IEC 60364-4-41:2005 automatic disconnection of supply',
  'IEC 60364-4-43:2008 adiabatic equation and k values',
  'IEC 60909-0:2016 voltage factors for short-circuit currents',
  'NFPA 70 (NEC) 2023 informational notes on voltage drop',
  'AS/NZS 3000:2018 clause 3.6.2',
];
