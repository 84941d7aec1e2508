/**
 * Web Worker that runs the tank check (`runCheck`, check-input.ts) off the main thread, so a key
 * typed while a blend's check runs is never held up by it. Messages: { seq, tank, readings,
 * settings, rules } in, { seq, outcome } out. `runCheck` never throws: a refusal comes back inside the
 * outcome, as on the main thread.
 */
import { runCheck } from './check-input.js';
import type { Readings, Settings, TankRecord } from './types.js';
import type { SiteRules } from './site-rules.js';

export interface CheckRequest {
  seq: number;
  tank: TankRecord;
  readings: Readings;
  settings: Settings;
  rules: SiteRules;
}

const scope = self as unknown as {
  onmessage: ((e: MessageEvent<CheckRequest>) => void) | null;
  postMessage(message: unknown): void;
};

scope.onmessage = (e) => {
  const { seq, tank, readings, settings, rules } = e.data;
  scope.postMessage({ seq, outcome: runCheck(tank, readings, settings, rules) });
};
