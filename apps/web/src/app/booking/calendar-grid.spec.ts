import { TestBed } from '@angular/core/testing';
import { DateTime } from 'luxon';
import { monthDays, weekDays } from './calendar-days';
import { CalendarGrid } from './calendar-grid';

const zone = 'Europe/London';
const anchor = DateTime.fromISO('2026-10-21T12:00:00Z');
const lanes = [
  { id: 'a', name: 'Low-speed circuit' },
  { id: 'b', name: 'Open-jet hall' },
];

function render(days: ReturnType<typeof weekDays>) {
  TestBed.configureTestingModule({ imports: [CalendarGrid] });
  const fixture = TestBed.createComponent(CalendarGrid);
  fixture.componentRef.setInput('days', days);
  fixture.componentRef.setInput('lanes', lanes);
  fixture.componentRef.setInput('timeZone', zone);
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
});
