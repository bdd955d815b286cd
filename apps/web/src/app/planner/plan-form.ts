import { AbstractControl, FormArray, FormControl, FormGroup, ValidationErrors, Validators } from '@angular/forms';
import type { PlanInput, PlanInputDraft, ShapeInfo } from '@tunnelwright/contracts';
import { positiveNumber } from '../shared/positive-number';
import { dimensionNames, requiredDimensions, type DimensionName } from './shape-dimensions';

const num = (value: number | null, validators: ((control: AbstractControl) => ValidationErrors | null)[] = []) =>
  new FormControl<number | null>(value, validators);
const positiveRequired = [Validators.required, positiveNumber];

/** One row of the parts table: a library shape with its dimensions, or a custom part with a known C_D·A. */
export type PartForm = FormGroup<
  {
    type: FormControl<'shape' | 'custom'>;
    shapeId: FormControl<string>;
    label: FormControl<string>;
    count: FormControl<number | null>;
    dragArea: FormControl<number | null>;
  } & Record<DimensionName, FormControl<number | null>>
>;

/** The planner editor. Speeds are typed as a list, e.g. "20, 30, 40"; the yaw margin as a percentage. */
export type PlanForm = FormGroup<{
  name: FormControl<string>;
  parts: FormArray<PartForm>;
  speeds: FormControl<string>;
  tunnelId: FormControl<string>;
  /** A lab balance whose Fx capacity is the drag capacity; '' when the capacity is typed. */
  balanceId: FormControl<string>;
  dragCapacity: FormControl<number | null>;
  scale: FormControl<number | null>;
  yawMarginPercent: FormControl<number | null>;
  interferenceFactor: FormControl<number | null>;
  density: FormControl<number | null>;
  viscosity: FormControl<number | null>;
  groundSpeed: FormControl<number | null>;
  windSpeed: FormControl<number | null>;
  windDirection: FormControl<number | null>;
  seriesMaxWind: FormControl<number | null>;
  points: FormControl<number | null>;
  dwellSeconds: FormControl<number | null>;
  configurationChanges: FormControl<number | null>;
  changeMinutes: FormControl<number | null>;
  setupMinutes: FormControl<number | null>;
}>;

/** Reads "20, 30 40" as [20, 30, 40]; null when any entry is not a positive number. */
export function parseSpeeds(text: string): number[] | null {
  const entries = text.split(/[\s,;]+/).filter((entry) => entry !== '');
  const speeds = entries.map(Number);
  return speeds.length > 0 && speeds.every((speed) => Number.isFinite(speed) && speed > 0) ? speeds : null;
}

/** Validator for the speeds list. */
export function speedList(control: AbstractControl): ValidationErrors | null {
  const text = String(control.value ?? '');
  if (text.trim() === '') return { required: true };
  const speeds = parseSpeeds(text);
  if (!speeds) return { speeds: true };
  return speeds.length > 20 ? { tooManySpeeds: true } : null;
}

export function buildPartForm(type: 'shape' | 'custom' = 'shape'): PartForm {
  const dimensions = Object.fromEntries(dimensionNames.map((name) => [name, num(null, [positiveNumber])])) as Record<DimensionName, FormControl<number | null>>;
  const part: PartForm = new FormGroup({
    type: new FormControl<'shape' | 'custom'>(type, { nonNullable: true }),
    shapeId: new FormControl('', { nonNullable: true }),
    label: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(120)] }),
    count: num(1, [Validators.required, Validators.min(1), Validators.pattern(/^\d+$/)]),
    dragArea: num(null),
    ...dimensions,
  });
  applyPartValidators(part, null);
  return part;
}

/** Sets which fields a row requires: the chosen shape's dimensions, or a name and C_D·A for a custom part. */
export function applyPartValidators(part: PartForm, shape: ShapeInfo | null): void {
  const custom = part.controls.type.value === 'custom';
  const needed = new Set<DimensionName>(!custom && shape ? requiredDimensions(shape) : []);
  part.controls.shapeId.setValidators(custom ? [] : [Validators.required]);
  part.controls.label.setValidators(custom ? [Validators.required, Validators.maxLength(120)] : [Validators.maxLength(120)]);
  part.controls.dragArea.setValidators(custom ? positiveRequired : []);
  for (const name of dimensionNames) {
    part.controls[name].setValidators(needed.has(name) ? positiveRequired : [positiveNumber]);
  }
  for (const control of Object.values(part.controls)) control.updateValueAndValidity({ emitEvent: false });
  part.updateValueAndValidity();
}

/** The editor's starting values: ISA sea-level air, no interference allowance, +25 % for yawed attitudes. */
const planDefaults = {
  name: '',
  speeds: '20, 30, 40',
  tunnelId: '',
  balanceId: '',
  dragCapacity: null,
  scale: 1,
  yawMarginPercent: 25,
  interferenceFactor: 1,
  density: 1.225,
  viscosity: 1.7894e-5,
  groundSpeed: 15,
  windSpeed: 0,
  windDirection: 0,
  seriesMaxWind: 10,
  points: 60,
  dwellSeconds: 30,
  configurationChanges: 2,
  changeMinutes: 15,
  setupMinutes: 60,
} as const;

/** A typed drag capacity is required unless a balance gives it. */
function capacityUnlessBalance(control: AbstractControl): ValidationErrors | null {
  if (control.parent?.get('balanceId')?.value) return null;
  return Validators.required(control) ?? positiveNumber(control);
}

/** A fresh plan with one empty shape row and the defaults. */
export function buildPlanForm(): PlanForm {
  const d = planDefaults;
  const form: PlanForm = new FormGroup({
    name: new FormControl<string>(d.name, { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] }),
    parts: new FormArray<PartForm>([buildPartForm()]),
    speeds: new FormControl<string>(d.speeds, { nonNullable: true, validators: [speedList] }),
    tunnelId: new FormControl<string>(d.tunnelId, { nonNullable: true, validators: [Validators.required] }),
    balanceId: new FormControl<string>(d.balanceId, { nonNullable: true }),
    dragCapacity: num(d.dragCapacity, [capacityUnlessBalance]),
    scale: num(d.scale, [...positiveRequired, Validators.max(10)]),
    yawMarginPercent: num(d.yawMarginPercent, [Validators.required, Validators.min(0), Validators.max(200)]),
    interferenceFactor: num(d.interferenceFactor, [...positiveRequired, Validators.max(3)]),
    density: num(d.density, positiveRequired),
    viscosity: num(d.viscosity, positiveRequired),
    groundSpeed: num(d.groundSpeed, [...positiveRequired, Validators.max(400)]),
    windSpeed: num(d.windSpeed, [Validators.required, Validators.min(0), Validators.max(100)]),
    windDirection: num(d.windDirection, [Validators.required, Validators.min(0), Validators.max(360)]),
    seriesMaxWind: num(d.seriesMaxWind, [...positiveRequired, Validators.max(100)]),
    points: num(d.points, [Validators.required, Validators.min(0)]),
    dwellSeconds: num(d.dwellSeconds, [Validators.required, Validators.min(0)]),
    configurationChanges: num(d.configurationChanges, [Validators.required, Validators.min(0)]),
    changeMinutes: num(d.changeMinutes, [Validators.required, Validators.min(0)]),
    setupMinutes: num(d.setupMinutes, [Validators.required, Validators.min(0)]),
  });
  // Choosing a balance replaces the typed capacity; clearing it asks for one again. Both live as long as the form.
  form.controls.balanceId.valueChanges.subscribe((balanceId) => {
    if (balanceId && form.controls.dragCapacity.value !== null) form.controls.dragCapacity.setValue(null, { emitEvent: false });
    form.controls.dragCapacity.updateValueAndValidity();
  });
  return form;
}

/** Empties the editor back to one shape row and the defaults. */
export function resetPlanForm(form: PlanForm): void {
  form.controls.parts.clear({ emitEvent: false });
  form.controls.parts.push(buildPartForm(), { emitEvent: false });
  form.reset({ ...planDefaults });
}

const value = (control: FormControl<number | null>): number => control.value ?? Number.NaN;

/** The request body for a valid form. */
export function planDraftFrom(form: PlanForm): PlanInputDraft {
  const c = form.controls;
  return {
    parts: c.parts.controls.map((part) => {
      const p = part.controls;
      if (p.type.value === 'custom') {
        return {
          type: 'custom' as const,
          label: p.label.value.trim(),
          dragArea: value(p.dragArea),
          count: value(p.count),
          ...(p.frontalArea.value === null ? {} : { frontalArea: p.frontalArea.value }),
        };
      }
      const dimensions = Object.fromEntries(dimensionNames.filter((name) => p[name].value !== null).map((name) => [name, p[name].value]));
      return {
        type: 'shape' as const,
        shapeId: p.shapeId.value,
        dimensions,
        count: value(p.count),
        ...(p.label.value.trim() ? { label: p.label.value.trim() } : {}),
      };
    }),
    speeds: parseSpeeds(c.speeds.value) ?? [],
    tunnelId: c.tunnelId.value,
    ...(c.balanceId.value ? { balanceId: c.balanceId.value } : { dragCapacity: value(c.dragCapacity) }),
    scale: value(c.scale),
    yawMargin: value(c.yawMarginPercent) / 100,
    interferenceFactor: value(c.interferenceFactor),
    air: { density: value(c.density), viscosity: value(c.viscosity) },
    fullScale: {
      groundSpeed: value(c.groundSpeed),
      windSpeed: value(c.windSpeed),
      windDirection: value(c.windDirection),
      seriesMaxWind: value(c.seriesMaxWind),
    },
    duration: {
      points: value(c.points),
      dwellSeconds: value(c.dwellSeconds),
      configurationChanges: value(c.configurationChanges),
      changeMinutes: value(c.changeMinutes),
      setupMinutes: value(c.setupMinutes),
    },
  };
}

/** Fills the form from a saved version. */
export function fillPlanForm(form: PlanForm, name: string, input: PlanInput, shapes: readonly ShapeInfo[]): void {
  const parts = input.parts.map((saved) => {
    const part = buildPartForm(saved.type);
    if (saved.type === 'custom') {
      part.patchValue({ label: saved.label, dragArea: saved.dragArea, count: saved.count, frontalArea: saved.frontalArea ?? null });
      applyPartValidators(part, null);
    } else {
      part.patchValue({ shapeId: saved.shapeId, label: saved.label ?? '', count: saved.count, ...saved.dimensions });
      applyPartValidators(part, shapes.find((shape) => shape.id === saved.shapeId) ?? null);
    }
    return part;
  });
  form.controls.parts.clear({ emitEvent: false });
  for (const part of parts) form.controls.parts.push(part, { emitEvent: false });
  form.patchValue({
    name,
    speeds: input.speeds.join(', '),
    tunnelId: input.tunnelId,
    // A typed capacity wins over a balance in the evaluation, so the form keeps whichever the plan really uses.
    balanceId: input.dragCapacity === undefined ? (input.balanceId ?? '') : '',
    dragCapacity: input.dragCapacity ?? null,
    scale: input.scale,
    yawMarginPercent: Math.round(input.yawMargin * 1e6) / 1e4,
    interferenceFactor: input.interferenceFactor,
    density: input.air.density,
    viscosity: input.air.viscosity,
    groundSpeed: input.fullScale.groundSpeed,
    windSpeed: input.fullScale.windSpeed,
    windDirection: input.fullScale.windDirection,
    seriesMaxWind: input.fullScale.seriesMaxWind,
    ...input.duration,
  });
}
