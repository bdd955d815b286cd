import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { FormArray, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { ShapeInfo } from '@tunnelwright/contracts';
import { numberErrorText } from '../shared/number-error-text';
import { applyPartValidators, buildPartForm, type PartForm } from './plan-form';
import { dimensionLabels, shapeKindLabels, shownDimensions, type DimensionName } from './shape-dimensions';

/** The value a part's type select takes for a custom part; any other value is a shape id. */
export const CUSTOM_PART = '__custom__';

/**
 * The parts table of a plan: each row picks a library shape (grouped 2-D, 3-D, whole objects, with the
 * reference-area rule and source shown) and takes its dimensions and count, or is a custom part with a known C_D·A.
 */
@Component({
  selector: 'tw-parts-editor',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule],
  templateUrl: './parts-editor.html',
  styleUrl: './parts-editor.scss',
})
export class PartsEditor {
  /** The plan's parts; rows are added and removed in place. */
  readonly parts = input.required<FormArray<PartForm>>();
  readonly shapes = input.required<readonly ShapeInfo[]>();

  protected readonly customPart = CUSTOM_PART;
  protected readonly labels = dimensionLabels;
  protected readonly numberError = numberErrorText;
  protected readonly groups = computed(() =>
    (Object.keys(shapeKindLabels) as ShapeInfo['kind'][]).map((kind) => ({
      kind,
      label: shapeKindLabels[kind],
      shapes: this.shapes().filter((shape) => shape.kind === kind),
    })),
  );
  private readonly byId = computed(() => new Map(this.shapes().map((shape) => [shape.id, shape] as const)));

  protected shapeOf(part: PartForm): ShapeInfo | null {
    return part.controls.type.value === 'shape' ? (this.byId().get(part.controls.shapeId.value) ?? null) : null;
  }

  protected dimensionsOf(part: PartForm): DimensionName[] {
    const shape = this.shapeOf(part);
    return shape ? shownDimensions(shape) : [];
  }

  /** The label without its unit, for error messages. */
  protected plainLabel(name: DimensionName): string {
    return dimensionLabels[name].replace(/ \(.*\)$/, '');
  }

  protected pickerValue(part: PartForm): string {
    return part.controls.type.value === 'custom' ? CUSTOM_PART : part.controls.shapeId.value;
  }

  protected pick(part: PartForm, choice: string): void {
    if (choice === CUSTOM_PART) {
      part.controls.type.setValue('custom');
      part.controls.shapeId.setValue('');
    } else {
      part.controls.type.setValue('shape');
      part.controls.shapeId.setValue(choice);
    }
    part.controls.shapeId.markAsTouched();
    applyPartValidators(part, this.shapeOf(part));
  }

  protected coefficient(shape: ShapeInfo): string {
    const cd = shape.dragCoefficient;
    return typeof cd === 'number' ? `C_D ${cd}` : `C_D from the ${cd.curve} curve by Reynolds number`;
  }

  protected add(): void {
    this.parts().push(buildPartForm());
  }

  protected remove(index: number): void {
    this.parts().removeAt(index);
  }
}
