/** The phase of a tank in words. */
import type { FullKind, TankPhase } from '../thermo/check/types.js';

export const PHASE_WORDS: Record<TankPhase, string> = {
  'two-phase': 'Liquid and vapour',
  'liquid-full': 'Liquid-full: no vapour space',
  'vapour-only': 'Vapour only: no liquid',
  supercritical: 'Above the critical temperature: no liquid level',
};

/** The phase in words; a tank full of dense fluid is named as such (as hazardous as liquid-full). */
export function phaseWords(phase: TankPhase, full: FullKind | null | undefined): string {
  return full === 'dense-fluid'
    ? 'Full of dense fluid (above the critical temperature): no vapour space'
    : PHASE_WORDS[phase];
}
