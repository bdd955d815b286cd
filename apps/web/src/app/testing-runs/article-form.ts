import { FormControl, FormGroup, NonNullableFormBuilder, Validators } from '@angular/forms';
import type { Article, ArticleInput, ArticleKind, ReferenceAreaKind } from '@tunnelwright/contracts';
import { positiveNumber } from '../shared/positive-number';

/** Plain words for each kind of test article. */
export const articleKindLabels: Readonly<Record<ArticleKind, string>> = {
  road_vehicle: 'Road vehicle',
  building: 'Building or structure',
  sports_equipment: 'Sports equipment',
  aircraft_component: 'Aircraft component',
  sphere: 'Calibration sphere',
  other: 'Other',
};

/** Plain words for what the reference area is. */
export const referenceAreaKindLabels: Readonly<Record<ReferenceAreaKind, string>> = {
  frontal: 'Frontal area',
  planform: 'Planform area',
  wetted: 'Wetted area',
  other: 'Other',
};

/** The article editor's form: numbers are null while empty so "required" can speak for itself. */
export type ArticleForm = FormGroup<{
  organisationId: FormControl<string>;
  name: FormControl<string>;
  kind: FormControl<ArticleKind>;
  description: FormControl<string>;
  conditionOnReceipt: FormControl<string>;
  /** `YYYY-MM-DD` from the date field; '' while not recorded. */
  receivedOn: FormControl<string>;
  referenceArea: FormControl<number | null>;
  referenceAreaKind: FormControl<ReferenceAreaKind>;
  referenceLength: FormControl<number | null>;
  frontalArea: FormControl<number | null>;
  volume: FormControl<number | null>;
  scale: FormControl<number | null>;
  momentCentreX: FormControl<number | null>;
  momentCentreY: FormControl<number | null>;
  momentCentreZ: FormControl<number | null>;
}>;

/** Builds the form, filled from an existing article when editing; a new one belongs to `organisationId`. */
export function buildArticleForm(fb: NonNullableFormBuilder, article: Article | null, organisationId: string): ArticleForm {
  const positiveRequired = [Validators.required, positiveNumber];
  return fb.group({
    organisationId: fb.control(article?.organisationId ?? organisationId, Validators.required),
    name: fb.control(article?.name ?? '', [Validators.required, Validators.maxLength(120)]),
    kind: fb.control<ArticleKind>(article?.kind ?? 'road_vehicle', Validators.required),
    description: fb.control(article?.description ?? '', Validators.maxLength(2000)),
    conditionOnReceipt: fb.control(article?.conditionOnReceipt ?? '', Validators.maxLength(2000)),
    receivedOn: fb.control(article?.receivedOn ?? ''),
    referenceArea: new FormControl<number | null>(article?.referenceArea ?? null, positiveRequired),
    referenceAreaKind: fb.control<ReferenceAreaKind>(article?.referenceAreaKind ?? 'frontal', Validators.required),
    referenceLength: new FormControl<number | null>(article?.referenceLength ?? null, positiveRequired),
    frontalArea: new FormControl<number | null>(article?.frontalArea ?? null, positiveNumber),
    volume: new FormControl<number | null>(article?.volume ?? 0, Validators.min(0)),
    scale: new FormControl<number | null>(article?.scale ?? 1, positiveRequired),
    momentCentreX: new FormControl<number | null>(article?.momentCentre.x ?? 0, Validators.required),
    momentCentreY: new FormControl<number | null>(article?.momentCentre.y ?? 0, Validators.required),
    momentCentreZ: new FormControl<number | null>(article?.momentCentre.z ?? 0, Validators.required),
  });
}

/** Reads a valid form into the API's input (SI units, as the form asks for them). */
export function articleInputFrom(form: ArticleForm): ArticleInput {
  const value = form.getRawValue();
  return {
    organisationId: value.organisationId,
    name: value.name.trim(),
    kind: value.kind,
    description: value.description.trim(),
    conditionOnReceipt: value.conditionOnReceipt.trim(),
    receivedOn: value.receivedOn === '' ? null : value.receivedOn,
    referenceArea: value.referenceArea ?? 0,
    referenceAreaKind: value.referenceAreaKind,
    referenceLength: value.referenceLength ?? 0,
    frontalArea: value.frontalArea,
    volume: value.volume ?? 0,
    scale: value.scale ?? 1,
    momentCentre: { x: value.momentCentreX ?? 0, y: value.momentCentreY ?? 0, z: value.momentCentreZ ?? 0 },
  };
}

/** The form control a field of the API's validation problem refers to, e.g. `momentCentre.x` → `momentCentreX`. */
export function articleControlName(field: string): string {
  const centre = /^momentCentre\.([xyz])$/.exec(field);
  return centre ? `momentCentre${centre[1]?.toUpperCase() ?? ''}` : field;
}
