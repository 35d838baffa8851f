// Public API of the budget engine. Pure: no I/O, no React, no Node built-ins.
export { simulateTrip, simulateParsed } from './simulate';
export { checkFixes, checkFixesParsed, withFixes, type CheckFixesOptions } from './check-fixes';
export { FIX_HOLD_SHARE } from './fixes';
export { findHeadroom, findHeadroomParsed } from './headroom';
export {
  APPLIANCE_LIBRARY,
  libraryItem,
  applianceFromLibrary,
  type LibraryItem,
  type LibraryBasis,
} from './appliance-library';
export { DEMO_TRIPS, highlandLoop, desertSpringLoop } from './demo-trips';
export type * from './result-types';
export type { HeadroomResult, HeadroomLever } from './headroom';
export { sunPosition, sunPositionWithTrue, cooperDeclinationDeg, sunFromHourAngle, dayOfYearUtc } from './sun-position';
export { spencerFactor, extraterrestrialW } from './extraterrestrial';
export { haurwitzGhi, ineichenPerez, kastenYoungAirMass, pressureRatio } from './clear-sky';
export { SKY_CLEARNESS, SKY_ORDER, shiftSky } from './sky-outlook';
export { erbs, erbsDiffuseFraction } from './decomposition';
export {
  cosIncidence,
  isotropicSkyDiffuse,
  groundReflected,
  hayDaviesSkyDiffuse,
  planeOfArray,
  poaComponents,
  skyViewOfTilt,
  groundViewOfTilt,
} from './transposition';
export {
  resolveExposure,
  beamFactor,
  diffuseFactor,
  horizonAt,
  skyViewFromHorizon,
  canopyBeamTransmittance,
  canopyDiffuseTransmittance,
  leafOff,
  SITE_PRESETS,
} from './site-exposure';
export { noctCellTempC, effectiveNoctC, pvDcPowerW, FLUSH_EXTRA_C } from './pv-module';
export { martinRuizIam, martinRuizDiffuse, MARTIN_RUIZ_AR } from './iam';
export { arrayOutput, controllerLimitW, moduleClassFor, pwmShareOfRated } from './charge-controller';
export { currentAt, deSotoParams, maxPowerPoint, openCircuitV, MODULE_CLASSES } from './single-diode';
export { CHEMISTRY, peukertRuntimeH, peukertFactor, acceptanceLimitShare } from './battery';
export { coldCapacityShare, chargeBlockedByCold, batteryTemperatureC } from './battery-temperature';
export { inverterDcDrawW, dcCurrentA, checkOverload, pvwattsAcW, pvwattsDcW, PVWATTS_ETA_REF } from './inverter';
export { scheduledShare, applianceStep, applianceEnergyWh } from './loads';
export {
  cabinModel,
  envelopeAreaM2,
  freeRunningC,
  heatToMoveW,
  meanVerticalIrradiance,
  cabinSolarGainW,
  INSULATION_U,
  PERSON_W,
} from './cabin';
export { thermostatCapacityW, COOLING_COP, FUEL_HEATER_EFFICIENCY, ELECTRIC_HEATER_EFFICIENCY } from './climate';
export { ambientC } from './temperature-curve';
export { hookupCapacityW, chargerDcW } from './hookup';
export { vehicleChargeW } from './vehicle-charging';
export { defaultFuelModel, generatorFuel, generatorEfficiency, FUEL_CURVES, CONTINUOUS_SHARE } from './generator';
export * from './fuel';
