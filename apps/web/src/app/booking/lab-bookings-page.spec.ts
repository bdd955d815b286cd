import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { provideRouter } from '@angular/router';
import type { UserSummary } from '@tunnelwright/contracts';
import { LabBookingsPage } from './lab-bookings-page';
import { bookingFixture } from './testing/booking-fixtures';

const labId = '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a';

function technician(index: number, name: string): UserSummary {
  return {
    id: `00000000-0000-4000-8000-${String(index).padStart(12, '0')}`,
    email: `tech${index}@example.test`,
    name,
    role: 'technician',
    organisationId: labId,
    organisationName: 'Brightwater Aero Lab',
    active: true,
    activated: true,
    createdAt: '2026-01-15T09:00:00.000Z',
  };
}

const confirmed = bookingFixture();

describe('LabBookingsPage', () => {
  it('asks the API for active technicians only and offers exactly those in the picker', async () => {
    TestBed.configureTestingModule({
      imports: [LabBookingsPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    const fixture = TestBed.createComponent(LabBookingsPage);
    fixture.detectChanges();
    const backend = TestBed.inject(HttpTestingController);
    backend.expectOne('/api/bookings').flush([confirmed]);
    backend.expectOne((request) => request.url === '/api/services').flush([]);
    const users = backend.expectOne((request) => request.url === '/api/users');
    expect(users.request.params.get('role')).toBe('technician');
    expect(users.request.params.get('active')).toBe('true');
    users.flush({ items: [technician(1, 'Rhea Calder'), technician(2, 'Tobias Wren')], total: 2 });
    await fixture.whenStable();

    const picker = await TestbedHarnessEnvironment.loader(fixture).getHarness(MatSelectHarness);
    await picker.open();
    const options = await Promise.all((await picker.getOptions()).map((option) => option.getText()));
    expect(options).toEqual(['Nobody yet', 'Rhea Calder', 'Tobias Wren']);
  });
});
