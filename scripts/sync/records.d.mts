import type { CheckRecord, TankRecord } from '../../components/types.js';
export function tank(id: string, over?: Partial<TankRecord>): TankRecord;
export function check(id: string, tankId: string, at?: string): CheckRecord;
