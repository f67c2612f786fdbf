// @ts-nocheck
export { pistonLapse, turbochargedPistonLapse, turbopropLapse, turbofanLapse, electricLapse } from './lapse';
export { lapseAt, availableFraction } from './available-fraction';
export { isPropellerDriven, shaftPowerLoading } from './propeller';
