/**
 * Vortex shedding per submerged zone: the band of f_s = St·U/D over the zone's range of flow speed,
 * for the frequency chart. Low edge: the lowest speed with the band's low St; high edge: the highest speed
 * with the band's high St, so the band covers the Strouhal uncertainty as well as the speed range.
 */
import { reynoldsNumber, sheddingFrequencyHz } from './formulas';
import { characteristicSizeM } from './mode-location';
import type { FlowProfile } from './profile';
import { flowSpeedRange } from './profile';
import type { ZoneShedding } from './results';
import type { SheddingConditions } from './shedding-point';
import { strouhalFor } from './shedding-point';
import type { SubmergedZone } from './types';

export function zoneShedding(zone: SubmergedZone, zoneIndex: number, profile: FlowProfile, cond: SheddingConditions): ZoneShedding {
  const d = characteristicSizeM(zone.section);
  // A shielded zone has its own (constant) flow instead of the case's profile.
  const { minMPerS, maxMPerS } =
    zone.flowSpeedMPerS !== undefined ? { minMPerS: zone.flowSpeedMPerS, maxMPerS: zone.flowSpeedMPerS } : flowSpeedRange(profile, zone.fromM, zone.toM);
  const nu = cond.liquid.kinematicViscosityM2PerS;
  const stLow = strouhalFor(zone, reynoldsNumber(minMPerS, d, nu), cond);
  const reMax = reynoldsNumber(maxMPerS, d, nu);
  const stHigh = strouhalFor(zone, reMax, cond);
  return {
    zoneIndex,
    characteristicSizeM: d,
    speedMinMPerS: minMPerS,
    speedMaxMPerS: maxMPerS,
    reynoldsMax: reMax,
    strouhal: stHigh,
    sheddingFrequencyLowHz: sheddingFrequencyHz(stLow.low, minMPerS, d),
    sheddingFrequencyHighHz: sheddingFrequencyHz(stHigh.high, maxMPerS, d),
    ...(zone.shieldedBy !== undefined ? { shieldedBy: zone.shieldedBy } : {}),
  };
}
