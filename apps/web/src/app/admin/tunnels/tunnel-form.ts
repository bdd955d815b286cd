import { AbstractControl, FormControl, FormGroup, NonNullableFormBuilder, ValidationErrors, Validators } from '@angular/forms';
import type { Tunnel, TunnelInput, TunnelKind } from '@tunnelwright/contracts';
import { positiveNumber } from '../../shared/positive-number';

/** The tunnel editor's form: numbers are null while empty so "required" can speak for itself. */
export type TunnelForm = FormGroup<{
  name: FormControl<string>;
  kind: FormControl<TunnelKind>;
  description: FormControl<string>;
  width: FormControl<number | null>;
  height: FormControl<number | null>;
  area: FormControl<number | null>;
  length: FormControl<number | null>;
  minSpeed: FormControl<number | null>;
  maxSpeed: FormControl<number | null>;
  pressureGradient: FormControl<number | null>;
  shapeFactor: FormControl<number | null>;
  yawRange: FormControl<number | null>;
  groundSimulation: FormControl<boolean>;
  turbulenceIntensity: FormControl<number | null>;
}>;

/** Rounds away binary noise such as 0.30000000000000004 from unit conversions. */
function roundTiny(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}

/** The API keeps turbulence intensity as a fraction; people read and type it as a percentage. */
function percentFromFraction(fraction: number | undefined): number | null {
  return fraction === undefined ? null : roundTiny(fraction * 100);
}

/** Group validator: the maximum speed must not be below the minimum speed. */
export function speedOrder(group: AbstractControl): ValidationErrors | null {
  const min = group.get('minSpeed')?.value as number | null;
  const max = group.get('maxSpeed')?.value as number | null;
  return min !== null && max !== null && max < min ? { speedOrder: true } : null;
}

/** Builds the form, filled from an existing tunnel when editing, with the catalogue's defaults otherwise. */
export function buildTunnelForm(fb: NonNullableFormBuilder, tunnel?: Tunnel): TunnelForm {
  const positiveRequired = [Validators.required, positiveNumber];
  return fb.group({
    name: fb.control(tunnel?.name ?? '', [Validators.required, Validators.maxLength(120)]),
    kind: fb.control<TunnelKind>(tunnel?.kind ?? 'closed', Validators.required),
    description: fb.control(tunnel?.description ?? '', Validators.maxLength(2000)),
    width: new FormControl<number | null>(tunnel?.width ?? null, positiveRequired),
    height: new FormControl<number | null>(tunnel?.height ?? null, positiveRequired),
    area: new FormControl<number | null>(tunnel?.area ?? null, positiveRequired),
    length: new FormControl<number | null>(tunnel?.length ?? null, positiveRequired),
    minSpeed: new FormControl<number | null>(tunnel?.minSpeed ?? 0, [Validators.required, Validators.min(0)]),
    maxSpeed: new FormControl<number | null>(tunnel?.maxSpeed ?? null, positiveRequired),
    pressureGradient: new FormControl<number | null>(tunnel?.pressureGradient ?? 0, Validators.required),
    shapeFactor: new FormControl<number | null>(tunnel?.shapeFactor ?? 0.86, positiveRequired),
    yawRange: new FormControl<number | null>(tunnel?.capabilities.yawRange ?? null, [
      Validators.min(0),
      Validators.max(360),
    ]),
    groundSimulation: fb.control(tunnel?.capabilities.groundSimulation ?? false),
    turbulenceIntensity: new FormControl<number | null>(
      percentFromFraction(tunnel?.capabilities.turbulenceIntensity),
      Validators.min(0),
    ),
  }, { validators: speedOrder });
}

/** Reads a valid form into the API's input; open-jet constants are kept from the tunnel being edited. */
export function tunnelInputFrom(form: TunnelForm, tunnel?: Tunnel): TunnelInput {
  const value = form.getRawValue();
  const capabilities: TunnelInput['capabilities'] = {};
  if (value.yawRange !== null) {
    capabilities.yawRange = value.yawRange;
  }
  if (value.groundSimulation) {
    capabilities.groundSimulation = true;
  }
  if (value.turbulenceIntensity !== null) {
    capabilities.turbulenceIntensity = roundTiny(value.turbulenceIntensity / 100);
  }
  return {
    name: value.name.trim(),
    kind: value.kind,
    description: value.description.trim(),
    width: value.width ?? 0,
    height: value.height ?? 0,
    area: value.area ?? 0,
    length: value.length ?? 0,
    minSpeed: value.minSpeed ?? 0,
    maxSpeed: value.maxSpeed ?? 0,
    pressureGradient: value.pressureGradient ?? 0,
    shapeFactor: value.shapeFactor ?? 0.86,
    openJetConstants: tunnel?.openJetConstants ?? {},
    capabilities,
  };
}
