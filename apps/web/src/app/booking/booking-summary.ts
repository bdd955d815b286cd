import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatChipsModule } from '@angular/material/chips';
import type { Booking } from '@tunnelwright/contracts';
import { formatMoney } from '../shared/money';
import { BookingAttachmentList } from './booking-attachment-list';
import { bookingStateLabels } from './booking-state-labels';
import { formatPeriod } from './lab-time';
import { quoteLineKindLabels } from './quote-editor';
import { referenceAreaKindLabels } from './reference-area-kind-labels';

/** One booking as a card: period in the lab's zone, state, articles, test plan, quote and documents; actions are projected. */
@Component({
  selector: 'tw-booking-summary',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatCardModule, MatChipsModule, BookingAttachmentList],
  templateUrl: './booking-summary.html',
  styles: `
    mat-card {
      margin-bottom: 16px;
    }
    .state {
      margin-left: 8px;
    }
    dl {
      display: grid;
      grid-template-columns: max-content 1fr;
      gap: 4px 16px;
      margin: 8px 0;
    }
    dt {
      color: var(--mat-sys-on-surface-variant);
    }
    dd {
      margin: 0;
    }
    table {
      border-collapse: collapse;
    }
    td,
    th {
      padding: 2px 12px 2px 0;
      text-align: left;
    }
    .numeric {
      text-align: right;
      font-variant-numeric: tabular-nums;
    }
  `,
})
export class BookingSummary {
  readonly booking = input.required<Booking>();
  /** Whether to show the customer organisation (for lab staff). */
  readonly showOrganisation = input(false);

  protected readonly stateLabels = bookingStateLabels;
  protected readonly areaLabels = referenceAreaKindLabels;
  protected readonly lineLabels = quoteLineKindLabels;
  protected readonly period = computed(() => formatPeriod(this.booking().period, this.booking().timeZone));
  protected readonly counterPeriod = computed(() => {
    const counter = this.booking().counterProposal;
    return counter ? formatPeriod(counter.period, this.booking().timeZone) : null;
  });
  protected readonly speeds = computed(() => this.booking().testPlan.speeds.join(', '));

  protected money(minor: number, currency: string | null): string {
    return currency ? formatMoney(minor, currency) : String(minor);
  }
}
