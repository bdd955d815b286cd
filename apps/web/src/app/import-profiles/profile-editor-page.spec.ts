import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import type { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import type { ComponentFixture } from '@angular/core/testing';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatCheckboxHarness } from '@angular/material/checkbox/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { By } from '@angular/platform-browser';
import { Router, provideRouter } from '@angular/router';
import type { Preview } from '@tunnelwright/contracts';
import { FileDropZone } from '../shared/file-drop-zone';
import { ProfileEditorPage } from './profile-editor-page';

const sample = new File(['# run: 1\nclock;step\n'], 'logger.csv', { type: 'text/csv' });

function preview(issues: Preview['issues']): Preview {
  return { fileName: 'logger.csv', valid: issues.length === 0, header: null, sampleCount: issues.length === 0 ? 120 : 0, pointCount: issues.length === 0 ? 7 : 0, firstSamples: [], issues };
}

const notANumber = { code: 'NOT_A_NUMBER', message: 'cell "1509,07" is not a number', fileName: 'logger.csv', line: 7, column: 5 };

// Each test drives a dozen harness steps; on a busy machine that takes longer than vitest's 5 s default.
const slow = 30_000;

describe('ProfileEditorPage', () => {
  let fixture: ComponentFixture<ProfileEditorPage>;
  let loader: HarnessLoader;
  let backend: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [ProfileEditorPage], providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([{ path: 'import-profiles', children: [] }])] });
    fixture = TestBed.createComponent(ProfileEditorPage);
    await fixture.whenStable();
    loader = TestbedHarnessEnvironment.loader(fixture);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  const input = async (label: string | RegExp) => (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getControl(MatInputHarness);
  const select = async (label: string | RegExp) => (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getControl(MatSelectHarness);
  const errors = async (label: string | RegExp) => (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getTextErrors();
  const saveButton = () => loader.getHarness(MatButtonHarness.with({ text: 'Save profile' }));
  const dropSample = async () => {
    fixture.debugElement.query(By.directive(FileDropZone)).componentInstance.files.emit([sample]);
    await fixture.whenStable();
  };
  const answerTry = async (answer: Preview): Promise<TestRequest> => {
    const request = backend.expectOne('/api/runs/preview');
    request.flush(answer);
    await fixture.whenStable();
    return request;
  };
  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';

  /** Fills the form for a semicolon file with a decimal comma, a units row and two listed columns. */
  async function describeLoggerLayout(): Promise<void> {
    await (await input('Name'))?.setValue('Semicolon logger (invented)');
    await (await select('Between fields'))?.open();
    await (await select('Between fields'))?.clickOptions({ text: /Semicolon/ });
    await (await loader.getHarness(MatCheckboxHarness.with({ label: /decimal comma/ }))).check();
    await (await loader.getHarness(MatCheckboxHarness.with({ label: /own row/ }))).check();
    await (await loader.getHarness(MatButtonHarness.with({ text: /Add a column/ }))).click();
    await (await input('Their column 1'))?.setValue('qinf');
    await (await select('Our column 1'))?.open();
    await (await select('Our column 1'))?.clickOptions({ text: /^q · dynamic pressure/ });
    await (await loader.getHarness(MatButtonHarness.with({ text: /Add a column/ }))).click();
    await (await input('Their column 2'))?.setValue('side');
    await (await select('Our column 2'))?.open();
    await (await select('Our column 2'))?.clickOptions({ text: /^Fy · / });
    await (await input('Scale factor 2'))?.setValue('-1');
  }

  it('tries the sample with the profile the form describes and saves that profile with the sample', async () => {
    await describeLoggerLayout();
    await dropSample();
    const tried = await answerTry(preview([]));
    const expected = {
      name: 'Semicolon logger (invented)',
      delimiter: ';',
      decimalComma: true,
      skipLines: 0,
      unitsRow: true,
      unmappedColumns: 'keep',
      columns: [
        { source: 'qinf', channel: 'q', drop: false },
        { source: 'side', channel: 'Fy', scale: -1, drop: false },
      ],
    };
    const triedBody = tried.request.body as FormData;
    expect(JSON.parse(triedBody.get('profile') as string)).toEqual(expected);
    expect((triedBody.get('file') as File).name).toBe('logger.csv');
    expect(text()).toContain('120 samples in 7 points');

    await (await saveButton()).click();
    const save = backend.expectOne('/api/import-profiles');
    expect(save.request.method).toBe('POST');
    const body = save.request.body as FormData;
    expect(body.get('name')).toBe('Semicolon logger (invented)');
    expect(JSON.parse(body.get('profile') as string)).toEqual(expected);
    expect((body.get('file') as File).name).toBe('logger.csv');
    save.flush({ id: '0f3b1c9e-2d4a-4b6c-8e1f-3a5b7c9d1e2f', name: 'Semicolon logger (invented)', description: '', profile: expected, createdBy: '1a2b3c4d-5e6f-4a1b-8c2d-3e4f5a6b7c8d', archived: false, createdAt: '2026-12-02T14:00:00.000Z', updatedAt: '2026-12-02T14:00:00.000Z' });
    await fixture.whenStable();
    expect(TestBed.inject(Router).url).toBe('/import-profiles');
  }, slow);

  it('says what is wrong with each field in words', async () => {
    await (await input('Name'))?.setValue('');
    await (await input('Name'))?.blur();
    expect(await errors('Name')).toEqual(['Enter a name']);

    await (await loader.getHarness(MatCheckboxHarness.with({ label: /decimal comma/ }))).check();
    expect(await errors('Between fields')).toEqual(['A decimal comma needs a delimiter other than the comma']);

    await (await input('Lines to skip before the names'))?.setValue('1.5');
    await (await input('Lines to skip before the names'))?.blur();
    expect(await errors('Lines to skip before the names')).toEqual(['Use a whole number from 0 to 1000']);

    await (await loader.getHarness(MatButtonHarness.with({ text: /Add a column/ }))).click();
    await (await loader.getHarness(MatButtonHarness.with({ text: /Add a column/ }))).click();
    await (await input('Their column 1'))?.setValue('Side');
    await (await input('Their column 2'))?.setValue('side');
    await (await input('Their column 2'))?.blur();
    expect(await errors('Their column 2')).toEqual(['This column is listed twice']);
    await (await input('Scale factor 1'))?.setValue('0');
    await (await input('Scale factor 1'))?.blur();
    expect(await errors('Scale factor 1')).toEqual(['A scale factor cannot be 0']);
    expect(await (await saveButton()).isDisabled()).toBe(true);
  }, slow);

  it('keeps Save off until the sample reads through the current profile without an issue', async () => {
    await (await input('Name'))?.setValue('Semicolon logger (invented)');
    await (await select('Between fields'))?.open();
    await (await select('Between fields'))?.clickOptions({ text: /Semicolon/ });
    expect(await (await saveButton()).isDisabled()).toBe(true);
    expect(text()).toContain('Drop a sample file');

    await dropSample();
    await answerTry(preview([notANumber]));
    expect(text()).toContain('Line 7, column 5: cell "1509,07" is not a number');
    expect(await (await saveButton()).isDisabled()).toBe(true);

    await (await loader.getHarness(MatCheckboxHarness.with({ label: /decimal comma/ }))).check();
    expect(text()).toContain('The profile changed since the last try');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Try the sample again' }))).click();
    const tried = await answerTry(preview([]));
    expect(JSON.parse((tried.request.body as FormData).get('profile') as string)).toMatchObject({ delimiter: ';', decimalComma: true });
    expect(await (await saveButton()).isDisabled()).toBe(false);

    // Changing the profile after a clean try needs another try before saving.
    await (await loader.getHarness(MatCheckboxHarness.with({ label: /own row/ }))).check();
    expect(await (await saveButton()).isDisabled()).toBe(true);
  }, slow);

  it('shows the API’s field errors on their fields and the sample’s issues in a list', async () => {
    await (await input('Name'))?.setValue('Semicolon logger (invented)');
    await dropSample();
    await answerTry(preview([]));
    await (await saveButton()).click();
    backend.expectOne('/api/import-profiles').flush(
      {
        title: 'Already exists',
        status: 409,
        detail: 'An import profile of the lab already has this name',
        errors: [{ field: 'name', message: 'An import profile of the lab already has this name' }],
      },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();
    expect(await errors('Name')).toEqual(['An import profile of the lab already has this name']);

    await (await input('Name'))?.setValue('Semicolon logger 2 (invented)');
    await (await saveButton()).click();
    backend.expectOne('/api/import-profiles').flush(
      { title: 'Profile does not fit the sample', status: 400, detail: 'The sample file read through the profile has 1 issue(s)', errors: [{ field: 'file', message: 'line 5, column 1: the names row has no column "qinf"' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(text()).toContain('line 5, column 1: the names row has no column "qinf"');
  }, slow);
});
