/**
 * The register as the shell holds it: the tanks, each one's newest check in brief, every check,
 * and at start-up the list's first screen until the whole register is in. pwa/register-load.ts
 * reads into it; every change asks the shell to render again.
 */
import type { ReactiveController, ReactiveControllerHost } from 'lit';
import type { CheckBrief, CheckRecord, TankRecord } from '../components/types.js';
import { table } from './lookups.js';
import type { RegisterHead, RegisterSink } from './register-load.js';

export class RegisterState implements RegisterSink, ReactiveController {
  tanks: TankRecord[] = [];
  checks: CheckRecord[] = [];
  /** Newest check per tank, for the list (read without reading every check). */
  last = table<CheckBrief>();
  /** The list's first screen while the whole register is read at start-up, else null. */
  firstScreen: RegisterHead | null = null;

  constructor(private readonly host: ReactiveControllerHost) {
    host.addController(this);
  }

  hostConnected(): void {}

  gotFirst(head: RegisterHead): void {
    this.firstScreen = head;
    this.host.requestUpdate();
  }

  gotHead(head: RegisterHead): void {
    this.tanks = head.tanks;
    this.last = head.last;
    this.firstScreen = null;
    this.host.requestUpdate();
  }

  gotChecks(checks: CheckRecord[]): void {
    this.checks = checks;
    this.host.requestUpdate();
  }

  /** A tank by id (among the first screen's while only that is read). */
  tank(id: string): TankRecord | undefined {
    return (this.firstScreen?.tanks ?? this.tanks).find((t) => t.id === id);
  }
}
