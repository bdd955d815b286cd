import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ResultSheet } from '@tunnelwright/contracts';
import { DocumentPage } from './document-page';

const sheet: ResultSheet = {
  id: '8d9e0f1a-2b3c-4d4e-9f5a-6b7c8d9e0f1a',
  testId: '9e0f1a2b-3c4d-4e5f-8a6b-7c8d9e0f1a2b',
  testTitle: 'Pedestrian footbridge deck, 1:25 (invented)',
  organisationId: '0f1a2b3c-4d5e-4f6a-9b7c-8d9e0f1a2b3c',
  organisationName: 'Marrowby Spans',
  series: 'BAL-2026-0014',
  revision: 1,
  reportNumber: 'BAL-2026-0014-R1',
  state: 'superseded',
  issueDate: '2026-11-20',
  issuedAt: '2026-11-20T14:00:00.000Z',
  sha256: 'b'.repeat(64),
  size: 150_000,
  pageCount: 4,
  revisionReason: null,
  supersedes: null,
  supersededBy: { id: '1a2b3c4d-5e6f-4a7b-8c8d-9e0f1a2b3c4d', reportNumber: 'BAL-2026-0014-R2', issueDate: '2026-11-27' },
  authorisedBy: { name: 'Ottilie Brande', role: 'analyst' },
  verificationUrl: 'http://localhost/verify/BAL-2026-0014-R1',
  caution: 'Tunnel results are not design loads.',
};

describe('DocumentPage', () => {
  let fixture: ComponentFixture<DocumentPage>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  beforeEach(() => {
    TestBed.configureTestingModule({ imports: [DocumentPage], providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    fixture = TestBed.createComponent(DocumentPage);
    fixture.componentRef.setInput('id', sheet.id);
    host = fixture.nativeElement as HTMLElement;
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
  });

  afterEach(() => backend.verify());

  it('says a superseded sheet was replaced, by which, and shows its hash, signatory and the caution', async () => {
    backend.expectOne(`/api/result-sheets/${sheet.id}`).flush(sheet);
    await fixture.whenStable();
    expect(host.querySelector('[role=status]')?.textContent).toContain('superseded on 27 Nov 2026 by BAL-2026-0014-R2');
    expect(host.querySelector('a[href="/documents/1a2b3c4d-5e6f-4a7b-8c8d-9e0f1a2b3c4d"]')).not.toBeNull();
    expect(host.textContent).toContain('Ottilie Brande, Analyst');
    expect(host.textContent).toContain('PDF, 4 page(s), 146.5 kB');
    expect(host.querySelector('code.hash')?.textContent).toBe('b'.repeat(64));
    expect(host.querySelector('[role=note]')?.textContent).toContain('Tunnel results are not design loads.');
    expect(host.querySelector('a[href="/verify/BAL-2026-0014-R1"]')).not.toBeNull();
  });

  it('says plainly when there is no sheet for the caller', async () => {
    backend
      .expectOne(`/api/result-sheets/${sheet.id}`)
      .flush({ type: 'about:blank', title: 'Not found', status: 404, detail: 'The result sheet was not found.' }, { status: 404, statusText: 'Not Found' });
    await fixture.whenStable();
    expect(host.querySelector('h1')?.textContent).toBe('Result sheet not found');
    expect(host.textContent).toContain('There is no result sheet here for you');
  });
});
