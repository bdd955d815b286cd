import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import type { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { By } from '@angular/platform-browser';
import { provideRouter } from '@angular/router';
import type { Preview, Run, SavedImportProfile } from '@tunnelwright/contracts';
import { FileDropZone } from '../shared/file-drop-zone';
import { UploadPage } from './upload-page';

const testId = '5d1f2a3b-4c5d-4e6f-8a7b-9c0d1e2f3a4b';
const run: Run = {
  id: '6e2a3b4c-5d6e-4f7a-8b9c-0d1e2f3a4b5c',
  testId,
  runNumber: 1,
  kind: 'data',
  configurationLabel: 'baseline',
  notes: '',
  rawFiles: [],
  createdAt: '2026-12-02T09:00:00.000Z',
  updatedAt: '2026-12-02T09:00:00.000Z',
};
const logger: SavedImportProfile = {
  id: '7f3b4c5d-6e7f-4a8b-9c0d-1e2f3a4b5c6d',
  name: 'Semicolon logger (invented)',
  description: '',
  profile: { name: 'Semicolon logger (invented)', delimiter: ';', decimalComma: true },
  createdBy: '8a4c5d6e-7f8a-4b9c-8d1e-2f3a4b5c6d7e',
  archived: false,
  createdAt: '2026-12-02T09:00:00.000Z',
  updatedAt: '2026-12-02T09:00:00.000Z',
};
const clean: Preview = { fileName: 'logger.txt', valid: true, header: null, sampleCount: 840, pointCount: 7, firstSamples: [], issues: [] };
const file = new File(['time;step\n'], 'logger.txt', { type: 'text/plain' });

describe('UploadPage reading files with an import profile', () => {
  let fixture: ComponentFixture<UploadPage>;
  let loader: HarnessLoader;
  let backend: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [UploadPage], providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])] });
    fixture = TestBed.createComponent(UploadPage);
    fixture.componentRef.setInput('id', testId);
    backend = TestBed.inject(HttpTestingController);
    // Not whenStable: the page's loads are pending tasks until their answers are flushed below.
    TestBed.tick();
    backend.expectOne(`/api/tests/${testId}`).flush({ id: testId, title: 'Logger sweep (invented)', configurations: [] });
    backend.expectOne(`/api/tests/${testId}/runs`).flush([run]);
    backend.expectOne((request) => request.url === '/api/import-profiles').flush([logger]);
    await fixture.whenStable();
    loader = TestbedHarnessEnvironment.loader(fixture);
  });

  afterEach(() => backend.verify());

  const choose = async (label: string, option: string | RegExp) => {
    const select = await (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getControl(MatSelectHarness);
    await select?.open();
    await select?.clickOptions({ text: option });
  };
  const previewRequest = () => backend.expectOne('/api/runs/preview');

  it('checks and uploads the files with the chosen profile, and checks them again when the choice changes', async () => {
    await choose('Read with', logger.name);
    fixture.debugElement.query(By.directive(FileDropZone)).componentInstance.files.emit([file]);
    const withProfile = previewRequest();
    expect((withProfile.request.body as FormData).get('profileId')).toBe(logger.id);
    withProfile.flush(clean);
    await fixture.whenStable();

    await choose('Read with', "Tunnelwright's own format");
    const standard = previewRequest();
    expect((standard.request.body as FormData).has('profileId')).toBe(false);
    standard.flush({ ...clean, valid: false, issues: [{ code: 'NOT_A_NUMBER', message: 'not a number', fileName: 'logger.txt', line: 7, column: 1 }] });
    await fixture.whenStable();
    expect(await (await loader.getHarness(MatButtonHarness.with({ text: /Upload 0 checked file/ }))).isDisabled()).toBe(true);

    await choose('Read with', logger.name);
    previewRequest().flush(clean);
    await fixture.whenStable();
    await choose('Run', /^Run 1/);
    await (await loader.getHarness(MatButtonHarness.with({ text: /Upload 1 checked file/ }))).click();
    const upload = backend.expectOne(`/api/runs/${run.id}/files`);
    expect((upload.request.body as FormData).get('profileId')).toBe(logger.id);
    expect(((upload.request.body as FormData).get('file') as File).name).toBe('logger.txt');
    upload.flush({ rawFile: { id: '9b5d6e7f-8a9b-4c0d-9e1f-2a3b4c5d6e7f', fileName: 'logger.txt', sizeBytes: 10, sha256: 'ab'.repeat(32), uploadedAt: '2026-12-02T09:01:00.000Z' }, reduction: null });
    await fixture.whenStable();
  }, 30_000);
});
