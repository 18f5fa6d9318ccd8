// The one public door of the physics engine. Pure TypeScript, no DOM.
// Each module below is one concept; see DEVELOPERS.md and REFERENCES.md.
export * from './errors';
export * from './units';
export * from './power';
export * from './jointLoss';
export * from './otdr';
export * from './linkBudget';
export * from './materials';
export * from './radialSolver';
export * from './laserSafety';
export * from './coupling';
export * from './bessel';
export * from './fiber';
export * from './lpModes';
export * from './dispersion';
export * from './bending';
export * from './modeField';
export * from './singleMode';
export * from './equivalentStepIndex';
export * from './equipmentBudget';
export * from './attenuationSpectrum';
export * from './ponBudget';
export * from './wdmGrid';
export * from './cwdmBudget';
