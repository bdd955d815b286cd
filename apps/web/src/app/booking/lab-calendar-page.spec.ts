import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { provideRouter } from '@angular/router';
import { DateTime } from 'luxon';
import { LabCalendarPage } from './lab-calendar-page';

const zone = 'Europe/London';
const tunnels = [
  { id: '3f1c2b4a-5d6e-4f70-8a9b-0c1d2e3f4a5b', name: 'Low-speed circuit' },
  { id: '4a2d3c5b-6e7f-4a81-9bac-1d2e3f4a5b6c', name: 'Open-jet hall' },
];

describe('LabCalendarPage', () => {
  it('opens the maintenance form for the tunnel and period of the free stretch chosen, and blocks exactly that', async () => {
    TestBed.configureTestingModule({
      imports: [LabCalendarPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([]), { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }],
    });
    const fixture = TestBed.createComponent(LabCalendarPage);
    fixture.detectChanges();
    const backend = TestBed.inject(HttpTestingController);
    backend.expectOne('/api/bookings').flush([]);
    backend.expectOne((request) => request.url === '/api/tunnels').flush(tunnels);
    backend.expectOne('/api/bookings/settings').flush({ holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50, timeZone: zone });
    backend.expectOne('/api/maintenance-blocks').flush([]);
    await fixture.whenStable();
    const loader = TestbedHarnessEnvironment.loader(fixture);
    const root = TestbedHarnessEnvironment.documentRootLoader(fixture);
    // Next week, so every day of it is still to come whenever the test runs.
    await (await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Later"]' }))).click();
    const wednesday = DateTime.now().setZone(zone).startOf('week').plus({ weeks: 1, days: 2 });
    const label = `Use Open-jet hall, ${wednesday.toFormat('ccc d LLL')}, all day for the period`;
    const slot = (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>(`button[aria-label="${label}"]`);
    expect(slot).not.toBeNull();
    slot?.click();
    await fixture.whenStable();

    const dialog = await root.getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Block a tunnel for maintenance');
    const field = (text: RegExp) => root.getHarness(MatFormFieldHarness.with({ floatingLabelText: text }));
    expect(await ((await (await field(/^Tunnel/)).getControl(MatSelectHarness)) as MatSelectHarness).getValueText()).toBe('Open-jet hall');
    const start = (await (await field(/^Start/)).getControl(MatInputHarness)) as MatInputHarness;
    const end = (await (await field(/^End/)).getControl(MatInputHarness)) as MatInputHarness;
    expect(await start.getValue()).toBe(`${wednesday.toFormat('yyyy-LL-dd')}T00:00`);
    expect(await end.getValue()).toBe(`${wednesday.plus({ days: 1 }).toFormat('yyyy-LL-dd')}T00:00`);
    await ((await (await field(/^What is the maintenance/)).getControl(MatInputHarness)) as MatInputHarness).setValue('Turning-vane inspection');
    await (await root.getHarness(MatButtonHarness.with({ text: 'Block the tunnel' }))).click();

    const created = backend.expectOne((request) => request.method === 'POST' && request.url === '/api/maintenance-blocks');
    expect(created.request.body).toEqual({
      tunnelId: tunnels[1]!.id,
      start: wednesday.toISO({ suppressMilliseconds: true }),
      end: wednesday.plus({ days: 1 }).toISO({ suppressMilliseconds: true }),
      reason: 'Turning-vane inspection',
    });
  });
});
