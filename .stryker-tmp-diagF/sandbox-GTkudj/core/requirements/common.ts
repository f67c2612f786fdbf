/**
 * What every resolved requirement has, whatever its kind (SI values).
 */
// @ts-nocheck


export interface RequirementCommon {
  id: string;
  label?: string;
  enabled: boolean;
  /** Pressure (geopotential) altitude [m]. */
  altitudeM: number;
  /** Offset from the ISA temperature [K]. */
  temperatureOffsetK: number;
  /** beta = W / W_TO at the requirement. */
  massFraction: number;
  /** Throttle fraction of rated power or thrust. */
  powerSetting: number;
  propellerEfficiency: number;
  /** Name of a configuration that exists in Aircraft.configurations. */
  configuration: string;
}
