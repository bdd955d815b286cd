import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { CalendarDay, freeStretches, nextWholeHour, overlapsDay, stretchTimes, timesOnDay } from './calendar-days';

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

/** A free stretch the user picked, to become the period of a form. */
export interface FreeSlot {
  readonly laneId: string;
  /** UTC instants, ISO 8601. */
  readonly start: string;
  readonly end: string;
}

interface CellItem {
  readonly times: string;
  readonly label: string;
  readonly kind: CalendarEntry['kind'] | 'free';
  readonly start: number;
  readonly end: number;
}

interface Cell {
  readonly key: string;
  readonly laneId: string;
  readonly items: readonly CellItem[];
}

/**
 * Tunnels against days. A week shows tunnels as rows and days as columns; a month turns it round
 * (days as rows) so thirty-odd days stay readable. With `chooseFree`, each free stretch still to come is a
 * button (click, Enter or Space) that hands the stretch to the page, to fill in a form's period.
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
    .free-slot {
      display: block;
      width: 100%;
      margin-bottom: 2px;
      padding: 2px 4px;
      border: 1px dashed var(--mat-sys-outline);
      border-radius: var(--mat-sys-corner-extra-small);
      background: transparent;
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
      text-align: left;
      cursor: pointer;
    }
    .free-slot:hover {
      background: var(--mat-sys-surface-container-high);
    }
    .free-slot:focus-visible {
      outline: 3px solid var(--mat-sys-primary);
      outline-offset: 1px;
    }
  `,
})
export class CalendarGrid {
  readonly days = input.required<readonly CalendarDay[]>();
  readonly lanes = input.required<readonly CalendarLane[]>();
  readonly entries = input<readonly CalendarEntry[]>([]);
  /** The lab's IANA zone the days are cut in. */
  readonly timeZone = input.required<string>();
  /** Whether free stretches still to come can be chosen. */
  readonly chooseFree = input(false);
  /** The present, in ms; free time before the lab clock's next whole hour cannot be chosen. */
  readonly now = input<number>(Date.now());
  /** Emitted with the free stretch the user chose. */
  readonly freeChosen = output<FreeSlot>();

  /** Whether days run down the side (month) rather than across (week). */
  protected readonly daysAsRows = computed(() => this.days().length > 7);

  /** cells()[lane][day]. */
  protected readonly cells = computed<Cell[][]>(() => {
    const zone = this.timeZone();
    const notBefore = nextWholeHour(this.now(), zone);
    return this.lanes().map((lane) => {
      const onLane = this.entries().filter((entry) => entry.laneId === lane.id);
      return this.days().map((day): Cell => {
        const busy = onLane.filter((entry) => overlapsDay(entry.period, day));
        const items: CellItem[] = busy.map((entry) => ({
          times: timesOnDay(entry.period, day, zone),
          label: entry.label,
          kind: entry.kind,
          start: Date.parse(entry.period.start),
          end: Date.parse(entry.period.end),
        }));
        if (this.chooseFree()) {
          for (const stretch of freeStretches(busy.map((entry) => entry.period), day, notBefore)) {
            const times = stretchTimes(stretch, day, zone);
            items.push({ times, label: `Use ${lane.name}, ${day.label}, ${times} for the period`, kind: 'free', ...stretch });
          }
        }
        return { key: `${lane.id}-${day.date}`, laneId: lane.id, items: items.sort((a, b) => a.start - b.start) };
      });
    });
  });

  protected choose(cell: Cell, item: CellItem): void {
    this.freeChosen.emit({ laneId: cell.laneId, start: new Date(item.start).toISOString(), end: new Date(item.end).toISOString() });
  }
}
