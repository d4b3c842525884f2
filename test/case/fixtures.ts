/**
 * Invented cases for tests and benchmarks (fictional Fernhaven harbour; no real site, company or person).
 * `demoCase()` is the "typical case" the link length is measured on: a pile with 12 inputs, 3 screening inputs,
 * a name, a tag and a short note.
 */
import type { Case, CaseMeasurement } from '../../src/case';

export function demoCase(): Case {
  return {
    format: 'wetmode-case',
    schemaVersion: 3,
    id: '3f6c2a9e-8b41-4d7a-9c15-2e0b7d4f6a81',
    name: 'Pile B7 — east berth',
    tag: 'FH-JTY-B7',
    note: 'Fender pile, Fernhaven jetty (fictional). Marine growth from diver survey, March.',
    kind: 'pile',
    unitSystem: 'si',
    inputs: {
      outerDiameter: '610 mm',
      wallThickness: '16 mm',
      length: '24 m',
      waterDepth: '18 m',
      embedment: '6 m',
      steelDensity: '7850 kg/m^3',
      youngsModulus: '210 GPa',
      contentsDensity: '1025 kg/m^3',
      marineGrowthThickness: '50 mm',
      marineGrowthDensity: '1325 kg/m^3',
      liquidDensity: '1025 kg/m^3',
      topMass: '2.5 t',
    },
    excitation: { currentSpeed: '1.2 m/s', wavePeriodMin: '4 s', wavePeriodMax: '12 s' },
    createdAt: '2026-03-14T09:21:05.123Z',
    updatedAt: '2026-03-14T10:02:47.880Z',
    appVersion: '0.1.0',
    keyResult: { lowestWetFrequencyHz: 1.8432, verdict: 'close' },
  };
}

/** A second, smaller case: a tank baffle in US units. */
export function baffleCase(): Case {
  return {
    format: 'wetmode-case',
    schemaVersion: 3,
    id: '9b2d4e61-0c7f-4a38-b5e2-61d0f3a9c7b4',
    name: 'Baffle 2, day tank',
    tag: 'GRV-TK-02',
    note: '',
    kind: 'baffle',
    unitSystem: 'us',
    inputs: { thickness: '0.5 in', span: '6 ft', width: '4 ft', liquidDensity: '53 lb/ft^3' },
    excitation: {},
    createdAt: '2026-04-02T14:00:00.000Z',
    updatedAt: '2026-04-02T14:05:00.000Z',
    appVersion: '0.1.0',
  };
}

/** A version-0 case (pre-release shape, see src/case/migrations.ts) with every field used. */
export function v0Case(): Record<string, unknown> {
  return {
    format: 'wetmode-case',
    schemaVersion: 0,
    id: '5A1E7C3B-2D94-4F60-8E1A-7B3C9D2E4F50',
    title: 'Level probe, settling tank',
    assetTag: 'GRV-LT-11',
    notes: 'From an early build.\nSecond line.',
    member: 'sensor-stem',
    units: 'imperial',
    fields: { insertionLength: '12 in', outerDiameter: '1 in' },
    screening: { flowSpeed: '3 ft/s' },
    savedAt: '2025-11-20T08:30:00Z',
    builtWith: '0.0.9',
  };
}

/** A plain deep copy, so a test can change a case freely. */
export function copy<T>(v: T): T {
  return JSON.parse(JSON.stringify(v)) as T;
}

/** An invented measurement at the fictional Fernhaven jetty. */
export function measured(over: Partial<CaseMeasurement> = {}): CaseMeasurement {
  return {
    id: '0b9e4c7a-1f2d-4e3b-8a6c-5d7e9f1a2b3c',
    takenAt: '2026-05-02T07:40:00.000Z',
    by: 'Surveyor, tablet on the pile head',
    elevation: '+2.0 m',
    waterLevel: '+0.8 m',
    frequencyHz: 1.84,
    uncertaintyHz: 0.02,
    mode: 1,
    state: 'wet',
    source: 'record',
    note: 'Calm, low tide.',
    ...over,
  };
}
