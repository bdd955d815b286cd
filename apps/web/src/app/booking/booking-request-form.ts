import { FormArray, FormControl, FormGroup, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import type { BookingRequest, ReferenceAreaKind } from '@tunnelwright/contracts';
import { labInstant } from './lab-time';
import { parseSpeeds, speedListValidator } from './speed-list';

export type ArticleForm = FormGroup<{
  name: FormControl<string>;
  referenceAreaKind: FormControl<ReferenceAreaKind | null>;
  description: FormControl<string>;
}>;

export function articleForm(): ArticleForm {
  return new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] }),
    referenceAreaKind: new FormControl<ReferenceAreaKind | null>(null, Validators.required),
    description: new FormControl('', { nonNullable: true, validators: Validators.maxLength(2000) }),
  });
}

/** The end of the period must come after its start. */
function periodOrder(group: AbstractControl): ValidationErrors | null {
  const { start, end } = (group as BookingRequestForm).getRawValue();
  return start && end && end <= start ? { periodOrder: true } : null;
}

/** The yaw sweep must end at or after its start. */
function yawOrder(group: AbstractControl): ValidationErrors | null {
  const { yawFrom, yawTo } = (group as BookingRequestForm).getRawValue();
  return yawFrom !== null && yawTo !== null && yawTo < yawFrom ? { yawOrder: true } : null;
}

const yaw = () => new FormControl<number | null>(null, [Validators.min(-180), Validators.max(180)]);

/** Form for a new booking request; times are `datetime-local` values read in the lab's zone. */
export function bookingRequestForm() {
  return new FormGroup(
    {
      tunnelId: new FormControl<string | null>(null, Validators.required),
      /** A saved test plan of the customer's organisation to attach, if any. */
      planId: new FormControl<string | null>(null),
      serviceId: new FormControl<string | null>(null),
      start: new FormControl('', { nonNullable: true, validators: Validators.required }),
      end: new FormControl('', { nonNullable: true, validators: Validators.required }),
      articles: new FormArray<ArticleForm>([articleForm()]),
      speeds: new FormControl('', { nonNullable: true, validators: speedListValidator }),
      yawFrom: yaw(),
      yawTo: yaw(),
      configurations: new FormControl('', { nonNullable: true, validators: Validators.maxLength(6000) }),
      note: new FormControl('', { nonNullable: true, validators: Validators.maxLength(4000) }),
    },
    { validators: [periodOrder, yawOrder] },
  );
}
export type BookingRequestForm = ReturnType<typeof bookingRequestForm>;

/** The request body the form describes; one configuration per line of the configurations box. */
export function bookingRequestOf(form: BookingRequestForm, labZone: string): BookingRequest {
  const raw = form.getRawValue();
  return {
    tunnelId: raw.tunnelId ?? '',
    serviceId: raw.serviceId,
    start: labInstant(raw.start, labZone) ?? raw.start,
    end: labInstant(raw.end, labZone) ?? raw.end,
    articles: raw.articles.map((article) => ({ name: article.name.trim(), description: article.description.trim(), referenceAreaKind: article.referenceAreaKind ?? 'frontal' })),
    testPlan: {
      speeds: parseSpeeds(raw.speeds) ?? [],
      yawRange: raw.yawFrom !== null && raw.yawTo !== null ? { from: raw.yawFrom, to: raw.yawTo } : null,
      configurations: raw.configurations
        .split('\n')
        .map((line) => line.trim())
        .filter((line) => line !== '')
        .map((label) => ({ label: label.slice(0, 120), description: '' })),
    },
    note: raw.note.trim(),
    ...(raw.planId ? { planId: raw.planId } : {}),
  };
}
