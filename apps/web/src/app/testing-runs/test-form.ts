import { AbstractControl, FormArray, FormControl, FormGroup, NonNullableFormBuilder, ValidationErrors, Validators } from '@angular/forms';
import type { Test, TestInput, TestState } from '@tunnelwright/contracts';

/** One configuration row: a label runs refer to and what the model looks like in it. */
export type ConfigurationRow = FormGroup<{ label: FormControl<string>; description: FormControl<string> }>;

/** The open-a-test form. The balance is '' when the test names none; the minimum samples are null to keep the default. */
export type TestForm = FormGroup<{
  organisationId: FormControl<string>;
  articleId: FormControl<string>;
  tunnelId: FormControl<string>;
  balanceId: FormControl<string>;
  title: FormControl<string>;
  state: FormControl<TestState>;
  configurations: FormArray<ConfigurationRow>;
  minimumSamplesPerPoint: FormControl<number | null>;
}>;

/** The reduction engine's own fewest samples per point when a test sets none (libs/aero reduction config). */
export const defaultMinimumSamplesPerPoint = 30;

/** Array validator: no two configurations may share a label (runs name their configuration by it). */
export function uniqueLabels(array: AbstractControl): ValidationErrors | null {
  const labels = (array as FormArray<ConfigurationRow>).controls.map((row) => row.controls.label.value.trim().toLowerCase()).filter((label) => label !== '');
  const repeated = labels.find((label, index) => labels.indexOf(label) !== index);
  return repeated === undefined ? null : { duplicateLabel: repeated };
}

/** Validator: empty, or a whole number of at least 1. */
export function optionalWholeAtLeastOne(control: AbstractControl): ValidationErrors | null {
  const value = control.value as number | null | '';
  if (value === null || value === '') return null;
  return typeof value === 'number' && Number.isInteger(value) && value >= 1 ? null : { wholeAtLeastOne: true };
}

export function configurationRow(fb: NonNullableFormBuilder, label = '', description = ''): ConfigurationRow {
  return fb.group({
    label: fb.control(label, [Validators.required, Validators.maxLength(80)]),
    description: fb.control(description, Validators.maxLength(2000)),
  });
}

/** Builds the form, filled from an existing test when editing. */
export function buildTestForm(fb: NonNullableFormBuilder, test?: Test): TestForm {
  return fb.group({
    organisationId: fb.control(test?.organisationId ?? '', Validators.required),
    articleId: fb.control(test?.articleId ?? '', Validators.required),
    tunnelId: fb.control(test?.tunnelId ?? '', Validators.required),
    balanceId: fb.control(test?.balanceId ?? ''),
    title: fb.control(test?.title ?? '', [Validators.required, Validators.maxLength(200)]),
    state: fb.control<TestState>(test?.state ?? 'planned', Validators.required),
    configurations: fb.array((test?.configurations ?? []).map((c) => configurationRow(fb, c.label, c.description)), { validators: uniqueLabels }),
    minimumSamplesPerPoint: new FormControl<number | null>(test?.reductionSettings.minimumSamplesPerPoint ?? null, optionalWholeAtLeastOne),
  });
}

/** Fills the form from a saved test, customer first so that its article is not cleared as belonging to another one. */
export function fillTestForm(fb: NonNullableFormBuilder, form: TestForm, test: Test): void {
  form.controls.configurations.clear();
  for (const c of test.configurations) form.controls.configurations.push(configurationRow(fb, c.label, c.description));
  form.patchValue({
    organisationId: test.organisationId,
    articleId: test.articleId,
    tunnelId: test.tunnelId,
    balanceId: test.balanceId ?? '',
    title: test.title,
    state: test.state,
    minimumSamplesPerPoint: test.reductionSettings.minimumSamplesPerPoint ?? null,
  });
}

/**
 * Reads a valid form into the API's input. Reduction settings the form does not show (corrections, zeros, …) are kept
 * from the test being edited; an empty minimum leaves the engine's default.
 */
export function testInputFrom(form: TestForm, test?: Test): TestInput {
  const value = form.getRawValue();
  const { minimumSamplesPerPoint: _previous, ...otherSettings } = test?.reductionSettings ?? {};
  return {
    organisationId: value.organisationId,
    articleId: value.articleId,
    tunnelId: value.tunnelId,
    balanceId: value.balanceId || null,
    title: value.title.trim(),
    state: value.state,
    configurations: value.configurations.map((c) => ({ label: c.label.trim(), description: c.description.trim() })),
    reductionSettings: value.minimumSamplesPerPoint === null ? otherSettings : { ...otherSettings, minimumSamplesPerPoint: value.minimumSamplesPerPoint },
  };
}

/** The form control a field of the API's validation problem refers to, e.g. `configurations.1.label`. */
export function testControlPath(field: string): string {
  return field === 'reductionSettings.minimumSamplesPerPoint' ? 'minimumSamplesPerPoint' : field;
}
