import type { TestCalibrationState } from '@tunnelwright/contracts';
import { Balance, BalanceCalibration, CalibrationOverride, User, type TestRecord } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { HttpError } from '../errors/http-error';

/** Today's date in UTC as `YYYY-MM-DD`. */
export function todayUtc(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** Whether a calibration's due date has passed. */
export function isOverdue(calibration: Pick<BalanceCalibration, 'dueOn'>, now: Date = new Date()): boolean {
  return calibration.dueOn < todayUtc(now);
}

/** The newest calibration version of a balance, if it has any. */
export async function currentCalibration(knex: Knex, balanceId: string): Promise<BalanceCalibration | undefined> {
  return BalanceCalibration.query(knex).where('balanceId', balanceId).orderBy('version', 'desc').first();
}

/** What a reduction records about the calibration it used. */
export interface CalibrationUse {
  calibration: BalanceCalibration | undefined;
  overrideId: string | null;
}

/**
 * Finds the calibration a run of `test` is reduced with and refuses (409) when it is past due, unless a
 * lab manager has recorded an override for this test and calibration.
 */
export async function requireUsableCalibration(knex: Knex, test: TestRecord, now: Date = new Date()): Promise<CalibrationUse> {
  if (!test.balanceId) return { calibration: undefined, overrideId: null };
  const calibration = await currentCalibration(knex, test.balanceId);
  if (!calibration || !isOverdue(calibration, now)) return { calibration, overrideId: null };
  const override = await CalibrationOverride.query(knex).findOne({ testId: test.id, calibrationId: calibration.id });
  if (override) return { calibration, overrideId: override.id };
  const balance = test.balance?.identifier ?? 'of this test';
  throw new HttpError(
    409,
    'Balance calibration overdue',
    `Calibration version ${calibration.version} of balance ${balance} was due on ${calibration.dueOn}, so runs of this test cannot be reduced. ` +
      'Recalibrate the balance, or ask a lab manager to record an override with a reason (POST /api/tests/:id/calibration-overrides).',
  );
}

/**
 * Where a test's balance calibration stands, for staff: the current version, whether it is past due, and the override
 * of this test for that version if one is on record. Null when the test names no balance.
 */
export async function testCalibrationState(knex: Knex, test: TestRecord, now: Date = new Date()): Promise<TestCalibrationState | null> {
  if (!test.balanceId) return null;
  const balance = await Balance.query(knex).findById(test.balanceId);
  if (!balance) return null;
  const calibration = await currentCalibration(knex, balance.id);
  const override = calibration ? await CalibrationOverride.query(knex).findOne({ testId: test.id, calibrationId: calibration.id }) : undefined;
  const grantedBy = override ? await User.query(knex).findById(override.grantedBy) : undefined;
  return {
    balanceId: balance.id,
    balanceIdentifier: balance.identifier,
    calibration: calibration
      ? { id: calibration.id, version: calibration.version, calibratedOn: calibration.calibratedOn, dueOn: calibration.dueOn, overdue: isOverdue(calibration, now) }
      : null,
    override: override
      ? {
          id: override.id,
          testId: override.testId,
          calibrationId: override.calibrationId,
          reason: override.reason,
          grantedBy: override.grantedBy,
          grantedByName: grantedBy?.name ?? '',
          createdAt: override.createdAt.toISOString(),
        }
      : null,
  };
}
