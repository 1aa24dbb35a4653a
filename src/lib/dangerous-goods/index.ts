/**
 * Dangerous-goods guidance for lithium batteries: classification, air (IATA DGR), sea (IMDG
 * Code) and road (ADR) summaries, a shipment summary, and the caution that goes with them.
 *
 * Pure modules: no framework imports.
 */
export * from './sources';
export * from './requirements';
export * from './caution';
export * from './lithium-battery';
export * from './lithium-air';
export * from './lithium-sea-road';
export * from './lithium-screening';
export * from './lithium-shipment';
