import { TestBed } from '@angular/core/testing';
import { DateTime } from 'luxon';
import { monthDays, weekDays } from './calendar-days';
import { CalendarGrid, type FreeSlot } from './calendar-grid';

const zone = 'Europe/London';
const anchor = DateTime.fromISO('2026-10-21T12:00:00Z');
let chosen: FreeSlot[] = [];
const lanes = [
  { id: 'a', name: 'Low-speed circuit' },
  { id: 'b', name: 'Open-jet hall' },
];

function render(days: ReturnType<typeof weekDays>, choose?: { now: string }) {
  TestBed.configureTestingModule({ imports: [CalendarGrid] });
  const fixture = TestBed.createComponent(CalendarGrid);
  fixture.componentRef.setInput('days', days);
  fixture.componentRef.setInput('lanes', lanes);
  fixture.componentRef.setInput('timeZone', zone);
  if (choose) {
    fixture.componentRef.setInput('chooseFree', true);
    fixture.componentRef.setInput('now', Date.parse(choose.now));
    fixture.componentInstance.freeChosen.subscribe((slot) => chosen.push(slot));
  }
  fixture.componentRef.setInput('entries', [
    { laneId: 'a', period: { start: '2026-10-20T08:00:00Z', end: '2026-10-20T16:00:00Z' }, label: 'Northfield Models · Confirmed', kind: 'booking' },
  ]);
  fixture.detectChanges();
  return fixture.nativeElement as HTMLElement;
}

describe('CalendarGrid', () => {
  it('shows a week as tunnels by days with the booking on its day, in lab time', () => {
    const element = render(weekDays(anchor, zone));
    const headers = [...element.querySelectorAll('thead th')].map((th) => th.textContent?.trim());
    expect(headers).toEqual(['Tunnel', 'Mon 19 Oct', 'Tue 20 Oct', 'Wed 21 Oct', 'Thu 22 Oct', 'Fri 23 Oct', 'Sat 24 Oct', 'Sun 25 Oct']);
    const firstRow = element.querySelectorAll('tbody tr')[0]!;
    const cells = [...firstRow.querySelectorAll('td')].map((td) => td.textContent?.trim());
    expect(cells[0]).toBe('Free');
    expect(cells[1]).toBe('09:00–17:00 Northfield Models · Confirmed');
    const secondRow = element.querySelectorAll('tbody tr')[1]!;
    expect([...secondRow.querySelectorAll('td')].every((td) => td.textContent?.trim() === 'Free')).toBe(true);
  });

  it('turns a month round so the days run down the side', () => {
    const element = render(monthDays(anchor, zone));
    expect(element.querySelectorAll('tbody tr')).toHaveLength(31);
    expect([...element.querySelectorAll('thead th')].map((th) => th.textContent?.trim())).toEqual(['Day', 'Low-speed circuit', 'Open-jet hall']);
  });

  it('offers each free stretch still to come as a button that hands its period over', () => {
    chosen = [];
    // Wednesday 21 October 2026, 13:20 in London (BST, UTC+1).
    const element = render(weekDays(anchor, zone), { now: '2026-10-21T12:20:00Z' });
    const rows = element.querySelectorAll('tbody tr');
    const cellsOf = (row: number) => [...rows[row]!.querySelectorAll('td')];
    // Monday and Tuesday are over: nothing to choose, the booking still shows.
    expect(cellsOf(0)[0]!.querySelectorAll('button')).toHaveLength(0);
    expect(cellsOf(0)[1]!.textContent?.trim()).toBe('09:00–17:00 Northfield Models · Confirmed');
    // Wednesday: from the next whole hour on.
    const wednesday = [...cellsOf(0)[2]!.querySelectorAll('button')];
    expect(wednesday.map((button) => button.textContent?.trim())).toEqual(['Free 14:00–24:00']);
    expect(wednesday[0]!.getAttribute('type')).toBe('button');
    expect(wednesday[0]!.getAttribute('aria-label')).toBe('Use Low-speed circuit, Wed 21 Oct, 14:00–24:00 for the period');
    // The clocks go back that Sunday, and the day is still offered whole.
    const sunday = cellsOf(1)[6]!.querySelector('button')!;
    expect(sunday.textContent?.trim()).toBe('Free all day');
    sunday.click();
    wednesday[0]!.click();
    expect(chosen).toEqual([
      { laneId: 'b', start: '2026-10-24T23:00:00.000Z', end: '2026-10-26T00:00:00.000Z' },
      { laneId: 'a', start: '2026-10-21T13:00:00.000Z', end: '2026-10-21T23:00:00.000Z' },
    ]);
  });

  it('puts free stretches between the bookings of a day, in time order', () => {
    chosen = [];
    const element = render(weekDays(anchor, zone), { now: '2026-10-01T00:00:00Z' });
    const tuesday = element.querySelectorAll('tbody tr')[0]!.querySelectorAll('td')[1]!;
    expect([...tuesday.children].map((child) => child.textContent?.trim())).toEqual(['Free 00:00–09:00', '09:00–17:00 Northfield Models · Confirmed', 'Free 17:00–24:00']);
    (tuesday.querySelectorAll('button')[1] as HTMLButtonElement).click();
    expect(chosen).toEqual([{ laneId: 'a', start: '2026-10-20T16:00:00.000Z', end: '2026-10-20T23:00:00.000Z' }]);
  });
});
