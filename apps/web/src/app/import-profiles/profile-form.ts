import { FormArray, FormControl, FormGroup, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import { EMPTY_PROFILE_FORM, type ProfileColumnValue, type ProfileDelimiter, type ProfileFormValue, type UnmappedColumns } from './profile-json';

/** One row of the column table. */
export type ProfileColumnGroup = FormGroup<{
  source: FormControl<string>;
  channel: FormControl<string>;
  unit: FormControl<string>;
  scale: FormControl<number | null>;
  drop: FormControl<boolean>;
}>;

/** The editor's whole form. */
export type ProfileForm = FormGroup<{
  name: FormControl<string>;
  description: FormControl<string>;
  delimiter: FormControl<ProfileDelimiter>;
  decimalComma: FormControl<boolean>;
  skipLines: FormControl<number | null>;
  unitsRow: FormControl<boolean>;
  unmappedColumns: FormControl<UnmappedColumns>;
  columns: FormArray<ProfileColumnGroup>;
}>;

/** A decimal comma cannot be told apart from a comma between fields, so the two exclude each other. */
function delimiterFitsDecimalComma(control: AbstractControl<ProfileDelimiter>): ValidationErrors | null {
  const decimalComma = control.parent?.get('decimalComma')?.value === true;
  return decimalComma && control.value === ',' ? { commaClash: true } : null;
}

/** A factor of 0 would wipe the channel out; the profile schema refuses it. */
function nonZero(control: AbstractControl<number | null>): ValidationErrors | null {
  return control.value === 0 ? { zero: true } : null;
}

/** Refuses a source column listed twice (only one of the two rows could apply). */
function uniqueSources(array: AbstractControl): ValidationErrors | null {
  const rows = (array as FormArray<ProfileColumnGroup>).controls;
  const seen = new Set<string>();
  for (const row of rows) {
    const source = row.controls.source;
    const key = source.value.trim().toLowerCase();
    const twice = key !== '' && seen.has(key);
    if (twice && !source.hasError('twice')) source.setErrors({ ...source.errors, twice: true });
    if (!twice && source.hasError('twice')) {
      const { twice: _twice, ...rest } = source.errors ?? {};
      source.setErrors(Object.keys(rest).length > 0 ? rest : null);
    }
    seen.add(key);
  }
  return null;
}

export function createColumnGroup(value: Partial<ProfileColumnValue> = {}): ProfileColumnGroup {
  return new FormGroup({
    source: new FormControl(value.source ?? '', { nonNullable: true, validators: [Validators.required, Validators.maxLength(200)] }),
    channel: new FormControl(value.channel ?? '', { nonNullable: true }),
    unit: new FormControl(value.unit ?? '', { nonNullable: true, validators: [Validators.maxLength(40)] }),
    scale: new FormControl<number | null>(value.scale ?? null, [nonZero]),
    drop: new FormControl(value.drop ?? false, { nonNullable: true }),
  });
}

/** A new editor form holding `value`; the delimiter is checked again whenever the decimal comma changes. */
export function createProfileForm(value: ProfileFormValue = EMPTY_PROFILE_FORM): ProfileForm {
  const form: ProfileForm = new FormGroup({
    name: new FormControl(value.name, { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] }),
    description: new FormControl(value.description, { nonNullable: true, validators: [Validators.maxLength(2000)] }),
    delimiter: new FormControl<ProfileDelimiter>(value.delimiter, { nonNullable: true, validators: [delimiterFitsDecimalComma] }),
    decimalComma: new FormControl(value.decimalComma, { nonNullable: true }),
    skipLines: new FormControl<number | null>(value.skipLines, [Validators.min(0), Validators.max(1000), Validators.pattern(/^\d+$/)]),
    unitsRow: new FormControl(value.unitsRow, { nonNullable: true }),
    unmappedColumns: new FormControl<UnmappedColumns>(value.unmappedColumns, { nonNullable: true }),
    columns: new FormArray(value.columns.map((column) => createColumnGroup(column)), [uniqueSources]),
  });
  form.controls.delimiter.updateValueAndValidity();
  form.controls.decimalComma.valueChanges.subscribe(() => {
    // Touched, so the clash shows at once on the delimiter rather than only after it is opened.
    form.controls.delimiter.markAsTouched();
    form.controls.delimiter.updateValueAndValidity();
  });
  return form;
}

/** Puts a saved profile's value into the form, rebuilding the column table. */
export function resetProfileForm(form: ProfileForm, value: ProfileFormValue): void {
  form.controls.columns.clear({ emitEvent: false });
  for (const column of value.columns) form.controls.columns.push(createColumnGroup(column), { emitEvent: false });
  form.reset({ ...value, columns: [...value.columns] });
  form.controls.delimiter.updateValueAndValidity();
}

/**
 * The control an API field error names: `name`, `description`, `profile.<field>` or
 * `profile.columns.<n>.<field>`; null when the form has no such control.
 */
export function controlForField(form: ProfileForm, field: string): AbstractControl | null {
  const path = field.startsWith('profile.') ? field.slice('profile.'.length) : field;
  if (path === 'profile' || path === 'file') return null;
  const control = form.get(path);
  return control && !(control instanceof FormArray) ? control : null;
}
