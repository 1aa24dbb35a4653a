/**
 * Trade codes and rules: ISO 6346 container numbers, HS codes, UN/LOCODE place codes, the
 * shipment life cycle and transport modes, Incoterms 2020 (rules, obligations, costs, checks and
 * the responsibility matrix).
 *
 * Pure modules: no framework imports.
 */
export * from './iso6346';
export * from './hs-code';
export * from './unlocode';
export * from './shipment-status';
export * from './incoterms';
export * from './incoterm-obligations';
export * from './incoterm-costs';
export * from './incoterm-checks';
export * from './responsibility-matrix';
