import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { provideRouter } from '@angular/router';
import type { Booking, UserSummary } from '@tunnelwright/contracts';
import { LabBookingsPage } from './lab-bookings-page';

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

const confirmed: Booking = {
  id: '9e8d7c6b-5a4f-4e3d-8c2b-1a0f9e8d7c6b',
  organisationId: '2a3b4c5d-6e7f-4a8b-9c0d-1e2f3a4b5c6d',
  organisationName: 'Northfield Models',
  tunnelId: '3f1c2b4a-5d6e-4f70-8a9b-0c1d2e3f4a5b',
  tunnelName: 'Low-speed circuit',
  serviceId: null,
  requestedBy: { id: '4b5c6d7e-8f90-4a1b-8c2d-3e4f5a6b7c8d', name: 'Ida Marsh' },
  period: { start: '2030-10-07T08:00:00.000Z', end: '2030-10-07T16:00:00.000Z', hours: 8 },
  state: 'confirmed',
  holdExpiresAt: null,
  technician: null,
  testPlan: { speeds: [20], yawRange: null, configurations: [] },
  articles: [{ name: 'Hatchback model, 1:4', description: '', referenceAreaKind: 'frontal' }],
  note: '',
  declineReason: null,
  counterProposal: null,
  cancellation: null,
  quote: null,
  attachments: [],
  testId: null,
  timeZone: 'Europe/London',
  createdAt: '2030-09-01T09:00:00.000Z',
  updatedAt: '2030-09-01T09:00:00.000Z',
};

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
