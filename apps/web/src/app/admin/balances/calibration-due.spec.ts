import { calibrationDue, daysBetween } from './calibration-due';

describe('calibrationDue', () => {
  it('says how late an overdue calibration is, going by the API flag', () => {
    expect(calibrationDue({ dueOn: '2026-11-30', overdue: true }, '2026-12-02')).toEqual({ tone: 'overdue', label: 'Overdue by 2 days' });
    expect(calibrationDue({ dueOn: '2026-12-01', overdue: true }, '2026-12-02')).toEqual({ tone: 'overdue', label: 'Overdue by 1 day' });
    // The server's day may already have turned while the browser's has not.
    expect(calibrationDue({ dueOn: '2026-12-02', overdue: true }, '2026-12-02')).toEqual({ tone: 'overdue', label: 'Overdue' });
  });

  it('counts the days left, warning from 30 days before the due date', () => {
    expect(calibrationDue({ dueOn: '2026-12-02', overdue: false }, '2026-12-02')).toEqual({ tone: 'soon', label: 'Due today' });
    expect(calibrationDue({ dueOn: '2026-12-03', overdue: false }, '2026-12-02')).toEqual({ tone: 'soon', label: 'Due in 1 day' });
    expect(calibrationDue({ dueOn: '2027-01-01', overdue: false }, '2026-12-02')).toEqual({ tone: 'soon', label: 'Due in 30 days' });
    expect(calibrationDue({ dueOn: '2027-01-02', overdue: false }, '2026-12-02')).toEqual({ tone: 'current', label: 'Due in 31 days' });
  });

  it('says when a balance was never calibrated', () => {
    expect(calibrationDue(null)).toEqual({ tone: 'none', label: 'Not calibrated' });
  });

  it('counts whole UTC days across a month and a leap day', () => {
    expect(daysBetween('2028-02-28', '2028-03-01')).toBe(2);
    expect(daysBetween('2026-03-28', '2026-03-30')).toBe(2);
  });
});
