import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatChipsModule } from '@angular/material/chips';
import { acceptsAttachments, type Booking, type BookingAttachment } from '@tunnelwright/contracts';
import { formatMoney } from '../shared/money';
import { BookingAttachmentAdder } from './booking-attachment-adder';
import { BookingAttachmentList } from './booking-attachment-list';
import { bookingStateLabels } from './booking-state-labels';
import { formatPeriod } from './lab-time';
import { quoteLineKindLabels } from './quote-editor';
import { referenceAreaKindLabels } from './reference-area-kind-labels';

/** One booking as a card: period in the lab's zone, state, articles, test plan, quote and documents; actions are projected. */
@Component({
  selector: 'tw-booking-summary',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatCardModule, MatChipsModule, BookingAttachmentList, BookingAttachmentAdder],
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
  /** Whether the viewer's role may add files (customers and lab managers); the booking must still be open. */
  readonly mayAttach = input(false);

  /** Files added from this card since the booking was loaded; dropped once a reload lists them too. */
  private readonly added = signal<readonly BookingAttachment[]>([]);
  protected readonly attachments = computed(() => {
    const known = this.booking().attachments;
    return [...known, ...this.added().filter((extra) => !known.some((attachment) => attachment.id === extra.id))];
  });
  protected readonly canAttach = computed(() => this.mayAttach() && acceptsAttachments(this.booking()));

  protected readonly stateLabels = bookingStateLabels;
  protected readonly areaLabels = referenceAreaKindLabels;
  protected readonly lineLabels = quoteLineKindLabels;
  protected readonly period = computed(() => formatPeriod(this.booking().period, this.booking().timeZone));
  protected readonly counterPeriod = computed(() => {
    const counter = this.booking().counterProposal;
    return counter ? formatPeriod(counter.period, this.booking().timeZone) : null;
  });
  protected readonly speeds = computed(() => this.booking().testPlan.speeds.join(', '));

  protected attached(attachments: readonly BookingAttachment[]): void {
    this.added.update((added) => [...added, ...attachments]);
  }

  protected money(minor: number, currency: string | null): string {
    return currency ? formatMoney(minor, currency) : String(minor);
  }
}
