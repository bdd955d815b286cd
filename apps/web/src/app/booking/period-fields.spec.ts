import { ChangeDetectionStrategy, Component } from '@angular/core';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { FormGroup } from '@angular/forms';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { PeriodFields, periodControls, readPeriod } from './period-fields';

@Component({
  selector: 'tw-period-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PeriodFields],
  template: `
    <tw-period-fields [controls]="form.controls" />
    <button type="button" (click)="form.markAllAsTouched()">Send</button>
  `,
})
class PeriodHost {
  readonly form = new FormGroup(periodControls('', '2026-10-05T17:00'));
}

describe('readPeriod', () => {
  it('reads both fields as wall time in the lab zone', () => {
    // Europe/London keeps summer time (UTC+1) until the last Sunday of October (IANA time zone database).
    const reading = readPeriod(periodControls('2026-10-05T09:00', '2026-10-05T17:00'), 'Europe/London');
    expect(reading).toEqual({ period: { start: '2026-10-05T09:00:00+01:00', end: '2026-10-05T17:00:00+01:00' }, outOfOrder: false });
  });

  it('says when the end is not after the start', () => {
    expect(readPeriod(periodControls('2026-10-05T09:00', '2026-10-05T09:00'), 'Europe/London').outOfOrder).toBe(true);
    expect(readPeriod(periodControls('2026-10-05T09:00', '2026-10-05T08:59'), 'Europe/London').outOfOrder).toBe(true);
  });

  it('gives no period while a field is empty, without calling it out of order', () => {
    expect(readPeriod(periodControls('', '2026-10-05T17:00'), 'Europe/London')).toEqual({ period: null, outOfOrder: false });
  });
});

describe('PeriodFields', () => {
  it('shows the error of an empty field once the form it belongs to is marked touched', async () => {
    const fixture = TestBed.createComponent(PeriodHost);
    await fixture.whenStable();
    const loader = TestbedHarnessEnvironment.loader(fixture);
    const start = await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^Start/ }));
    const end = await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^End/ }));
    expect(await start.getTextErrors()).toEqual([]);

    (fixture.nativeElement as HTMLElement).querySelector('button')?.click();
    await fixture.whenStable();

    expect(await start.getTextErrors()).toEqual(['Choose the start']);
    expect(await end.getTextErrors()).toEqual([]);
  });
});
