import { FormControl, FormGroup, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import type { BookingSettings } from '@tunnelwright/contracts';

/** The limits the API puts on the booking rules (see `bookingSettingsSchema`). */
export const bookingRuleLimits = {
  holdHours: { min: 1, max: 24 * 60 },
  lateCancellationDays: { min: 0, max: 365 },
  lateCancellationPercent: { min: 0, max: 100 },
} as const;

type RuleName = keyof typeof bookingRuleLimits;

/** Validator: the value, when given, is a whole number. */
function wholeNumber(control: AbstractControl): ValidationErrors | null {
  const value = control.value as number | null | '';
  if (value === null || value === '') return null;
  return typeof value === 'number' && Number.isInteger(value) ? null : { wholeNumber: true };
}

function ruleControl(name: RuleName): FormControl<number | null> {
  const { min, max } = bookingRuleLimits[name];
  return new FormControl<number | null>(null, [Validators.required, wholeNumber, Validators.min(min), Validators.max(max)]);
}

/** The lab manager's form for the booking rules. */
export function bookingRulesForm() {
  return new FormGroup({
    holdHours: ruleControl('holdHours'),
    lateCancellationDays: ruleControl('lateCancellationDays'),
    lateCancellationPercent: ruleControl('lateCancellationPercent'),
  });
}
export type BookingRulesForm = ReturnType<typeof bookingRulesForm>;

const wording: Record<RuleName, { missing: string; unit: string; whole: string }> = {
  holdHours: { missing: 'Enter how many hours a hold lasts', unit: 'hours', whole: 'Use whole hours' },
  lateCancellationDays: { missing: 'Enter how many days before the start the rule begins', unit: 'days', whole: 'Use whole days' },
  lateCancellationPercent: { missing: 'Enter the share of the quote charged', unit: '%', whole: 'Use a whole percentage' },
};

/** The message under one rule's field; empty when it is valid. A message from the server wins. */
export function ruleErrorText(form: BookingRulesForm, name: RuleName): string {
  const errors = form.controls[name].errors;
  if (!errors) return '';
  if (errors['server']) return String(errors['server']);
  const { min, max } = bookingRuleLimits[name];
  const words = wording[name];
  if (errors['required']) return words.missing;
  if (errors['wholeNumber']) return words.whole;
  if (errors['min'] || errors['max']) return `Between ${min} and ${max} ${words.unit}`;
  return words.missing;
}

/** The rules the form holds, once it is valid. */
export function bookingRulesOf(form: BookingRulesForm): BookingSettings {
  const raw = form.getRawValue();
  return { holdHours: raw.holdHours ?? 0, lateCancellationDays: raw.lateCancellationDays ?? 0, lateCancellationPercent: raw.lateCancellationPercent ?? 0 };
}

const holdText = (hours: number) => `${hours} ${hours === 1 ? 'hour' : 'hours'}`;
const lateText = (rules: BookingSettings) =>
  rules.lateCancellationPercent === 0
    ? 'nothing'
    : `${rules.lateCancellationPercent} % of the accepted quote when a customer cancels a confirmed booking within ${rules.lateCancellationDays} ${rules.lateCancellationDays === 1 ? 'day' : 'days'} of its start`;

/**
 * What saving `after` over `before` changes, in sentences for the confirmation, with when each change takes effect:
 * holds already running keep their end, while the late-cancellation rule applies to every cancellation from then on.
 */
export function describeRuleChanges(before: BookingSettings, after: BookingSettings): string[] {
  const changes: string[] = [];
  if (before.holdHours !== after.holdHours) {
    changes.push(`A provisional hold will last ${holdText(after.holdHours)} instead of ${holdText(before.holdHours)}, for holds started or renewed from now on; holds already running keep their end.`);
  }
  if (before.lateCancellationDays !== after.lateCancellationDays || before.lateCancellationPercent !== after.lateCancellationPercent) {
    changes.push(`Late cancellation will cost ${lateText(after)}, instead of ${lateText(before)}. This applies to every cancellation from now on, including bookings already confirmed.`);
  }
  return changes;
}
