// @ts-nocheck
export { inducedDragFactor, dragCoefficient, minimumDragCoefficient, polarOf, type Polar } from './drag-polar';
export { oswaldStraightWing, oswaldSweptWing, oswaldEstimate, SWEPT_WING_THRESHOLD_RAD } from './oswald';
export {
  minimumDragLiftCoefficient,
  minimumPowerLiftCoefficient,
  bestRangeLiftCoefficient,
  maximumLiftToDrag,
  liftToDrag,
} from './lift-coefficients';
export { speedForLiftCoefficient, stallSpeed, characteristicSpeeds, type CharacteristicSpeeds } from './speeds';
