import type { SignalSource, SignalWave, TachConvention } from './signal-source.schema';

/*
 * Synchronous speed n = 120 f / P, i.e. rpm = Hz × 60 / pole pairs
 * (S. J. Chapman, Electric Machinery Fundamentals, 5th ed., McGraw-Hill 2012, from memory).
 * One AC cycle passes per pole pair per revolution of the coil or alternator.
 */

const SECONDS_PER_MINUTE = 60;

export const polePairs = (poles: number): number => poles / 2;

/** Shaft speed of the coil or alternator itself from the frequency of its AC output. */
export const rpmFromFrequency = (hz: number, poles: number): number =>
  (hz * SECONDS_PER_MINUTE) / polePairs(poles);

/** AC frequency at a given coil or alternator shaft speed (the inverse of rpmFromFrequency). */
export const frequencyAtRpm = (rpm: number, poles: number): number =>
  (rpm * polePairs(poles)) / SECONDS_PER_MINUTE;

/** Belt-driven alternators turn faster than the crankshaft by the pulley ratio. */
export const engineRpmFromAlternatorRpm = (alternatorRpm: number, pulleyRatio: number): number =>
  alternatorRpm / pulleyRatio;

const pulleyRatioOf = (source: SignalSource): number =>
  source.kind === 'belt-alternator' ? source.pulleyRatio : 1;

/** AC cycles per engine revolution: pole pairs × pulley ratio. */
export const cyclesPerEngineRev = (source: SignalSource): number =>
  polePairs(source.poles) * pulleyRatioOf(source);

/** Engine (crankshaft) rpm from the measured AC frequency of the coil or alternator. */
export const engineRpmFromFrequency = (hz: number, source: SignalSource): number =>
  engineRpmFromAlternatorRpm(rpmFromFrequency(hz, source.poles), pulleyRatioOf(source));

/** AC frequency to expect at an engine rpm, for setting up or checking a tachometer. */
export const expectedFrequencyAtEngineRpm = (engineRpm: number, source: SignalSource): number =>
  (engineRpm * cyclesPerEngineRev(source)) / SECONDS_PER_MINUTE;

const pulsesPerCycle = (wave: SignalWave): number => (wave === 'full-wave' ? 2 : 1);

/** Pulses the tachometer counts per engine revolution. */
export const pulsesPerEngineRev = (source: SignalSource, wave: SignalWave = 'half-wave'): number =>
  cyclesPerEngineRev(source) * pulsesPerCycle(wave);

/**
 * The number to dial into a tachometer. A "poles" dial reads rpm = pulses/s × 120 / setting,
 * so its setting is twice the pulses per revolution; a "pulses-per-rev" dial takes the count.
 */
export function tachDialSetting(
  source: SignalSource,
  convention: TachConvention,
  wave: SignalWave = 'half-wave',
): number {
  const pulses = pulsesPerEngineRev(source, wave);
  return convention === 'poles' ? pulses * 2 : pulses;
}

/** What a tachometer shows for a pulse frequency, given how its dial is labelled and set. */
export function tachReadingRpm(
  pulseHz: number,
  convention: TachConvention,
  dialSetting: number,
): number {
  const pulsesPerRev = convention === 'poles' ? dialSetting / 2 : dialSetting;
  return (pulseHz * SECONDS_PER_MINUTE) / pulsesPerRev;
}
