import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { CalendarDay, overlapsDay, timesOnDay } from './calendar-days';

/** A row of the grid: one tunnel. */
export interface CalendarLane {
  readonly id: string;
  readonly name: string;
}

/** Something occupying a lane for a period. */
export interface CalendarEntry {
  readonly laneId: string;
  readonly period: { readonly start: string; readonly end: string };
  readonly label: string;
  readonly kind: 'booking' | 'maintenance';
}

interface Cell {
  readonly key: string;
  readonly items: readonly { readonly times: string; readonly label: string; readonly kind: CalendarEntry['kind'] }[];
}

/**
 * Tunnels against days. A week shows tunnels as rows and days as columns; a month turns it round
 * (days as rows) so thirty-odd days stay readable.
 */
@Component({
  selector: 'tw-calendar-grid',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [NgTemplateOutlet],
  templateUrl: './calendar-grid.html',
  styles: `
    .wrap {
      overflow-x: auto;
    }
    table {
      border-collapse: collapse;
      width: 100%;
      table-layout: fixed;
    }
    th,
    td {
      border: 1px solid var(--mat-sys-outline-variant);
      padding: 4px;
      vertical-align: top;
      text-align: left;
      min-width: 110px;
    }
    th {
      font: var(--mat-sys-label-large);
      background: var(--mat-sys-surface-container);
    }
    .entry {
      display: block;
      border-radius: var(--mat-sys-corner-extra-small);
      padding: 2px 4px;
      margin-bottom: 2px;
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
      font: var(--mat-sys-body-small);
    }
    .entry.maintenance {
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    .free {
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
    }
  `,
})
export class CalendarGrid {
  readonly days = input.required<readonly CalendarDay[]>();
  readonly lanes = input.required<readonly CalendarLane[]>();
  readonly entries = input<readonly CalendarEntry[]>([]);
  /** The lab's IANA zone the days are cut in. */
  readonly timeZone = input.required<string>();

  /** Whether days run down the side (month) rather than across (week). */
  protected readonly daysAsRows = computed(() => this.days().length > 7);

  /** cells()[lane][day]. */
  protected readonly cells = computed<Cell[][]>(() =>
    this.lanes().map((lane) =>
      this.days().map((day) => ({
        key: `${lane.id}-${day.date}`,
        items: this.entries()
          .filter((entry) => entry.laneId === lane.id && overlapsDay(entry.period, day))
          .sort((a, b) => Date.parse(a.period.start) - Date.parse(b.period.start))
          .map((entry) => ({ times: timesOnDay(entry.period, day, this.timeZone()), label: entry.label, kind: entry.kind })),
      })),
    ),
  );
}
