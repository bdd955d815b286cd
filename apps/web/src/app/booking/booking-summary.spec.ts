import { HttpEventType, provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatProgressBarHarness } from '@angular/material/progress-bar/testing';
import { By } from '@angular/platform-browser';
import type { Booking, BookingAttachment } from '@tunnelwright/contracts';
import { FileDropZone } from '../shared/file-drop-zone';
import { BookingSummary } from './booking-summary';
import { bookingFixture, fixtureBookingId } from './testing/booking-fixtures';

const uploadUrl = `/api/bookings/${fixtureBookingId}/attachments`;

const drawing: BookingAttachment = { id: '1f2e3d4c-5b6a-4978-8a9b-0c1d2e3f4a5b', filename: 'front-elevation.pdf', contentType: 'application/pdf', sizeBytes: 2048, sha256: 'ab', createdAt: '2030-09-01T09:00:00.000Z' };

const booking = (overrides: Partial<Booking> = {}) => bookingFixture({ attachments: [drawing], ...overrides });

function render(value: Booking, mayAttach = true): { fixture: ComponentFixture<BookingSummary>; loader: HarnessLoader; backend: HttpTestingController; text: () => string } {
  TestBed.configureTestingModule({ imports: [BookingSummary], providers: [provideHttpClient(), provideHttpClientTesting()] });
  const fixture = TestBed.createComponent(BookingSummary);
  fixture.componentRef.setInput('booking', value);
  fixture.componentRef.setInput('mayAttach', mayAttach);
  fixture.detectChanges();
  return { fixture, loader: TestbedHarnessEnvironment.loader(fixture), backend: TestBed.inject(HttpTestingController), text: () => (fixture.nativeElement as HTMLElement).textContent ?? '' };
}

/** Drops files on the shared drop zone, the way a browser hands them over. */
async function drop(fixture: ComponentFixture<BookingSummary>, ...files: File[]): Promise<void> {
  const zone = fixture.debugElement.query(By.directive(FileDropZone)).query(By.css('.zone'));
  zone.triggerEventHandler('drop', { preventDefault: () => undefined, dataTransfer: { files } });
  await fixture.whenStable();
}

const file = (name: string, bytes = 64) => new File([new Uint8Array(bytes)], name);
const addButton = (loader: HarnessLoader) => loader.getAllHarnesses(MatButtonHarness.with({ text: /Add drawings or photos/ }));

describe('BookingSummary adding files to an existing booking', () => {
  it('sends a dropped photo at once with its own progress, then lists it with the booking’s documents', async () => {
    const { fixture, loader, backend } = render(booking());
    await (await addButton(loader))[0]!.click();
    await drop(fixture, file('rig-photo.png'));
    const upload = backend.expectOne(uploadUrl);
    expect(upload.request.method).toBe('POST');
    expect((upload.request.body as FormData).getAll('files').map((sent) => (sent as File).name)).toEqual(['rig-photo.png']);
    upload.event({ type: HttpEventType.UploadProgress, loaded: 16, total: 64 });
    const progress = await loader.getHarness(MatProgressBarHarness.with({ selector: '[aria-label="Sending rig-photo.png"]' }));
    expect(await progress.getValue()).toBe(25);
    upload.flush([{ ...drawing, id: '5c6d7e8f-9a0b-4c1d-8e2f-3a4b5c6d7e8f', filename: 'rig-photo.png', contentType: 'image/png', sizeBytes: 64 }]);
    await fixture.whenStable();
    const documents = [...(fixture.nativeElement as HTMLElement).querySelectorAll('tw-booking-attachment-list .attachment > span')].map((row) => row.textContent?.trim());
    expect(documents).toEqual(['front-elevation.pdf (2.0 kB)', 'rig-photo.png (64 B)']);
    expect((fixture.nativeElement as HTMLElement).querySelector('[role="status"]')?.textContent).toContain('Attached rig-photo.png.');
    // Stored, so it leaves the list of files still to send.
    expect((fixture.nativeElement as HTMLElement).querySelector('[aria-label="Chosen files"]')).toBeNull();
  });

  it('refuses a file type the API does not take without sending it, and retries only the file that failed', async () => {
    const { fixture, loader, backend, text } = render(booking({ state: 'requested', holdExpiresAt: '2099-01-01T00:00:00.000Z' }));
    await (await addButton(loader))[0]!.click();
    await drop(fixture, file('notes.docx'));
    expect(text()).toContain('notes.docx: only PDF, PNG, JPEG, DWG and DXF files are accepted.');
    backend.expectNone(uploadUrl);

    await drop(fixture, file('plan-view.pdf'), file('side-view.pdf'));
    const [plan, side] = backend.match(uploadUrl);
    plan!.flush({ title: 'Invalid request', detail: 'plan-view.pdf is not a valid .pdf file' }, { status: 400, statusText: 'Bad Request' });
    side!.flush([{ ...drawing, id: '6d7e8f9a-0b1c-4d2e-8f3a-4b5c6d7e8f9a', filename: 'side-view.pdf' }]);
    await fixture.whenStable();
    expect(text()).toContain('One file could not be attached.');
    expect(text()).toContain('plan-view.pdf is not a valid .pdf file');

    // A file added meanwhile goes on its own; the failed one waits for the user to ask.
    await drop(fixture, file('wheel-detail.jpg'));
    const added = backend.expectOne(uploadUrl);
    expect((added.request.body as FormData).getAll('files').map((sent) => (sent as File).name)).toEqual(['wheel-detail.jpg']);
    added.flush([{ ...drawing, id: '8f9a0b1c-2d3e-4f4a-8b5c-6d7e8f9a0b1c', filename: 'wheel-detail.jpg', contentType: 'image/jpeg' }]);
    await fixture.whenStable();

    await (await loader.getHarness(MatButtonHarness.with({ text: 'Try again' }))).click();
    const retry = backend.expectOne(uploadUrl);
    expect((retry.request.body as FormData).getAll('files').map((sent) => (sent as File).name)).toEqual(['plan-view.pdf']);
    retry.flush([{ ...drawing, id: '7e8f9a0b-1c2d-4e3f-8a4b-5c6d7e8f9a0b', filename: 'plan-view.pdf' }]);
    await fixture.whenStable();
    expect(text()).not.toContain('could not be attached');
    expect(text()).toContain('plan-view.pdf');
    backend.verify();
  });

  it('offers no way to add files to a closed booking, a lapsed hold, or a viewer whose role may not', async () => {
    expect(await addButton(render(booking({ state: 'cancelled' })).loader)).toHaveLength(0);
    TestBed.resetTestingModule();
    expect(await addButton(render(booking({ state: 'quoted', holdExpiresAt: '2020-01-01T00:00:00.000Z' })).loader)).toHaveLength(0);
    TestBed.resetTestingModule();
    expect(await addButton(render(booking({ state: 'in_test' }), false).loader)).toHaveLength(0);
    TestBed.resetTestingModule();
    expect(await addButton(render(booking({ state: 'in_test' })).loader)).toHaveLength(1);
  });
});
