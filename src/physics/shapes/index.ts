/** Cross-section shapes of beam members: one description per shape (registry.ts), with their constructors. */
export * from './registry';
export type * from './types';
export { tubeSection, type TubeSection } from './tube';
export { rodSection, type RodSection } from './rod';
export { plateStripSection, type PlateStripSection } from './plate-strip';
export { hSection, hParts, H_SECTION_AXES, type HSection, type HSectionAxis } from './h-section';
export { cowperCircle, cowperRectangle } from './shear';
