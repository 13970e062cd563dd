export { effectiveModulus, effectiveRadius } from './effective';
export {
  hertzSphereAtForce,
  hertzSphereAtApproach,
  hertzSubsurfaceShear,
  type HertzSphereBodies,
  type HertzSphereAtForceInput,
  type HertzSphereAtApproachInput,
  type HertzSphereState,
  type HertzSubsurfaceShear,
} from './hertz-sphere';
export {
  hertzEllipticalAtApproach,
  type HertzEllipticalInput,
  type HertzEllipticalState,
} from './hertz-elliptical';
export {
  hertzCylinderPerLength,
  type HertzCylinderInput,
  type HertzCylinderState,
} from './hertz-cylinder';
export {
  hertzImpact,
  hertzImpactMaxDropHeight,
  type HertzImpactBodies,
  type HertzImpactInput,
  type HertzImpactHeightInput,
  type HertzImpactState,
} from './hertz-impact';
export {
  janssenVerticalPressure,
  janssenAsymptoticPressure,
  janssenMaxFillDepth,
  rectangularBinHydraulicRadius,
  type JanssenBin,
  type JanssenPressureInput,
  type JanssenDepthInput,
} from './janssen';
export {
  apparentModulusFromCompression,
  type ApparentModulusInput,
  type ApparentModulusFit,
} from './apparent-modulus';
export { hertzBruiseRadius, hertzForceForBruiseRadius, onsetContactRadius } from './hertz-bruise';
export {
  fitPeleg,
  pelegRetained,
  pelegTimeToShare,
  type PelegConstants,
  type PelegFit,
} from './relaxation';
