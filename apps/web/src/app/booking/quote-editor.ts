import { ChangeDetectionStrategy, Component, ElementRef, OnInit, computed, inject, input, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { QuoteInput, QuoteLineKind } from '@tunnelwright/contracts';
import { focusFirstInvalid } from '../shared/focus-first-invalid';
import { formatMoney, fromMinorUnits, toMinorUnits } from '../shared/money';
import { lineTotalMinor, quoteTotalMinor } from './quote-totals';

/** How each kind of quote line reads. */
export const quoteLineKindLabels: Readonly<Record<QuoteLineKind, string>> = {
  tunnel_hours: 'Tunnel hours',
  setup: 'Set-up',
  staff: 'Staff',
  extra: 'Extra',
};

type LineForm = FormGroup<{
  kind: FormControl<QuoteLineKind>;
  description: FormControl<string>;
  quantity: FormControl<number | null>;
  unitPrice: FormControl<number | null>;
}>;

/** Lines of a quote (tunnel hours × rate, set-up, staff, extras) with line and grand totals in integer minor units. */
@Component({
  selector: 'tw-quote-editor',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatIconModule],
  templateUrl: './quote-editor.html',
  styles: `
    .line {
      display: flex;
      flex-wrap: wrap;
      gap: 8px;
      align-items: baseline;
    }
    .kind {
      width: 150px;
    }
    .description {
      flex: 1 1 200px;
    }
    .number {
      width: 130px;
    }
    .line-total,
    .total {
      font-variant-numeric: tabular-nums;
      min-width: 110px;
      text-align: right;
    }
    .total {
      font: var(--mat-sys-title-medium);
    }
    .footer {
      display: flex;
      gap: 8px;
      align-items: center;
      justify-content: space-between;
      flex-wrap: wrap;
    }
  `,
})
export class QuoteEditor implements OnInit {
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  /** ISO 4217 code the prices are in. */
  readonly currency = input('EUR');
  /** Hours of tunnel time to prefill the first line with. */
  readonly hours = input(1);
  /** Hourly rate to prefill, minor units. */
  readonly hourlyRateMinor = input(0);
  /** Whether the quote is being sent (the button is disabled). */
  readonly sending = input(false);
  /** The finished quote, prices in minor units. */
  readonly quoteSubmitted = output<QuoteInput>();

  protected readonly kinds = Object.entries(quoteLineKindLabels) as [QuoteLineKind, string][];
  protected readonly form = this.fb.group({
    lines: this.fb.array<LineForm>([]),
    note: this.fb.control('', Validators.maxLength(4000)),
  });
  private readonly value = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });
  private readonly minorLines = computed(() =>
    (this.value().lines ?? []).map((line) => ({
      quantity: Number(line?.quantity ?? 0),
      unitPriceMinor: toMinorUnits(Number(line?.unitPrice ?? 0), this.currency()),
    })),
  );
  protected readonly lineTotals = computed(() => this.minorLines().map((line) => (Number.isInteger(line.quantity) ? this.money(lineTotalMinor(line)) : '—')));
  protected readonly total = computed(() => this.money(quoteTotalMinor(this.minorLines())));

  get lines(): FormArray<LineForm> {
    return this.form.controls.lines;
  }

  ngOnInit(): void {
    this.addLine('tunnel_hours', this.hours(), fromMinorUnits(this.hourlyRateMinor(), this.currency()));
  }

  protected money(minor: number): string {
    return formatMoney(minor, this.currency());
  }

  protected addLine(kind: QuoteLineKind = 'extra', quantity: number | null = 1, unitPrice: number | null = null): void {
    this.lines.push(
      this.fb.group({
        kind: this.fb.control<QuoteLineKind>(kind),
        description: this.fb.control('', Validators.maxLength(500)),
        quantity: new FormControl<number | null>(quantity, [Validators.required, Validators.min(1), Validators.max(10_000), Validators.pattern(/^\d+$/)]),
        unitPrice: new FormControl<number | null>(unitPrice, [Validators.required, Validators.min(0)]),
      }),
    );
  }

  protected removeLine(index: number): void {
    this.lines.removeAt(index);
  }

  protected submit(): void {
    if (this.form.invalid || this.lines.length === 0) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const raw = this.form.getRawValue();
    this.quoteSubmitted.emit({
      currency: this.currency(),
      note: raw.note,
      lines: raw.lines.map((line) => ({
        kind: line.kind,
        description: line.description,
        quantity: Number(line.quantity),
        unitPriceMinor: toMinorUnits(Number(line.unitPrice), this.currency()),
      })),
    });
  }
}
