import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { Router, provideRouter } from '@angular/router';
import type { Verification } from '@tunnelwright/contracts';
import { FileDropZone } from '../shared/file-drop-zone';
import { VerifyPage } from './verify-page';

const issued: Verification = {
  reportNumber: 'BAL-2026-0011-R2',
  issueDate: '2026-11-30',
  state: 'superseded',
  successor: { reportNumber: 'BAL-2026-0011-R3', issueDate: '2026-12-01' },
  sha256: 'e'.repeat(64),
};

describe('VerifyPage', () => {
  let fixture: ComponentFixture<VerifyPage>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  beforeEach(() => {
    TestBed.configureTestingModule({ imports: [VerifyPage], providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    fixture = TestBed.createComponent(VerifyPage);
    host = fixture.nativeElement as HTMLElement;
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  /** Opens the page for a number; the look-up stays pending (and the page busy) until the test answers it. */
  function open(reportNumber: string): void {
    fixture.componentRef.setInput('reportNumber', reportNumber);
    fixture.detectChanges();
  }

  it('shows only the number, date, state with the successor, and the hash', async () => {
    open(issued.reportNumber);
    backend.expectOne(`/api/verify/${issued.reportNumber}`).flush(issued);
    await fixture.whenStable();
    const text = host.textContent ?? '';
    expect(text).toContain('30 Nov 2026');
    expect(text).toContain('Superseded by BAL-2026-0011-R3 of 1 Dec 2026');
    expect(text).toContain('e'.repeat(64));
    expect(host.querySelector('a[href="/verify/BAL-2026-0011-R3"]')).not.toBeNull();
  });

  it('looks up a typed number when Enter submits the form, without leaving the page', async () => {
    open(issued.reportNumber);
    backend.expectOne(`/api/verify/${issued.reportNumber}`).flush(issued);
    await fixture.whenStable();
    const router = TestBed.inject(Router);
    const navigate = vi.spyOn(router, 'navigate').mockResolvedValue(true);
    const input = host.querySelector<HTMLInputElement>('form.lookup input')!;
    input.value = ' BAL-2026-0011-R3 ';
    input.dispatchEvent(new Event('input'));
    const submitted = new Event('submit', { cancelable: true });
    host.querySelector('form.lookup')!.dispatchEvent(submitted);
    expect(submitted.defaultPrevented).toBe(true);
    expect(navigate).toHaveBeenCalledWith(['/verify', 'BAL-2026-0011-R3']);
  });

  it('says clearly when no sheet has the number', async () => {
    open('BAL-1999-0001-R1');
    backend
      .expectOne('/api/verify/BAL-1999-0001-R1')
      .flush({ type: 'about:blank', title: 'Unknown report number', status: 404, detail: 'No sheet with the number BAL-1999-0001-R1 was issued by this laboratory.' }, { status: 404, statusText: 'Not Found' });
    await fixture.whenStable();
    expect(host.querySelector('[role=alert]')?.textContent).toContain('No sheet numbered BAL-1999-0001-R1 was issued.');
    expect(host.querySelector('tw-file-drop-zone')).toBeNull();
  });

  it('sends a dropped file as raw bytes and says plainly whether it is the issued file', async () => {
    open(issued.reportNumber);
    backend.expectOne(`/api/verify/${issued.reportNumber}`).flush({ ...issued, state: 'valid', successor: null });
    await fixture.whenStable();

    const file = new File([new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d])], 'copy.pdf', { type: 'application/pdf' });
    fixture.debugElement.query(By.directive(FileDropZone)).componentInstance.files.emit([file]);
    fixture.detectChanges();
    const request = backend.expectOne((candidate) => candidate.method === 'POST' && candidate.url === `/api/verify/${issued.reportNumber}`);
    expect(request.request.body).toBe(file);
    expect(request.request.headers.get('Content-Type')).toBe('application/octet-stream');
    expect(host.textContent).toContain('Checking copy.pdf');
    request.flush({ ...issued, state: 'valid', successor: null, matches: false, fileSha256: 'f'.repeat(64), fileSize: 5 });
    await fixture.whenStable();
    expect(host.querySelector('.outcome')?.textContent).toContain('No match: copy.pdf is not the issued file of BAL-2026-0011-R2.');
  });
});
