import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatProgressBarHarness } from '@angular/material/progress-bar/testing';
import { provideRouter } from '@angular/router';
import type { Preview } from '@tunnelwright/contracts';
import type { UploadItem } from './upload-item';
import { UploadList } from './upload-list';

const validPreview: Preview = {
  fileName: 'sweep.csv',
  valid: true,
  header: {
    metadata: {},
    columns: [
      { name: 'yaw', unit: 'deg', channel: 'yaw', siUnit: 'rad' },
      { name: 'Fx', unit: 'N', channel: 'Fx', siUnit: 'N' },
    ],
    loadKind: 'loads',
    pressureKind: 'dynamic',
    delimiter: ',',
  },
  sampleCount: 840,
  pointCount: 21,
  firstSamples: [{ line: 6, point: 1, yaw: -Math.PI / 18, dynamicPressure: 1509.07, barometricPressure: 100860, temperature: 294.45, loads: [68.8, -76.7, 23.1, -9.1, -5.9, -14.4] }],
  issues: [],
};

const badPreview: Preview = {
  ...validPreview,
  fileName: 'broken.csv',
  valid: false,
  firstSamples: [],
  issues: [{ code: 'NOT_A_NUMBER', message: 'Fx is not a number', fileName: 'broken.csv', line: 12, column: 9 }],
};

function item(key: number, name: string, change: Partial<UploadItem>): UploadItem {
  return { key, file: new File(['x'.repeat(2048)], name), phase: 'checked', preview: null, progress: 0, message: '', reductionId: null, existingRunId: null, ...change };
}

describe('UploadList', () => {
  let fixture: ComponentFixture<UploadList>;
  let loader: HarnessLoader;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ imports: [UploadList], providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])] });
    fixture = TestBed.createComponent(UploadList);
    loader = TestbedHarnessEnvironment.loader(fixture);
    backend = TestBed.inject(HttpTestingController);
  });

  const show = async (items: UploadItem[]) => {
    fixture.componentRef.setInput('items', items);
    await fixture.whenStable();
  };
  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';

  it('gives each uploading file its own progress bar at its own share of bytes sent', async () => {
    await show([item(1, 'first.csv', { phase: 'uploading', progress: 0.25 }), item(2, 'second.csv', { phase: 'uploading', progress: 0.8 })]);
    const bars = await loader.getAllHarnesses(MatProgressBarHarness);
    expect(await Promise.all(bars.map((bar) => bar.getValue()))).toEqual([25, 80]);
    expect(await Promise.all(bars.map((bar) => bar.getMode()))).toEqual(['determinate', 'determinate']);
  });

  it('shows an indeterminate bar while a file is being checked', async () => {
    await show([item(1, 'first.csv', { phase: 'checking' })]);
    const bar = await loader.getHarness(MatProgressBarHarness);
    expect(await bar.getMode()).toBe('indeterminate');
    expect(text()).toContain('Checking…');
  });

  it('shows the detected columns with their units and the first rows of a checked file', async () => {
    await show([item(1, 'sweep.csv', { preview: validPreview })]);
    expect(text()).toContain('840 samples in 21 points');
    expect(text()).toContain('yaw (deg → rad)');
    expect(text()).toContain('-10.00');
    expect(text()).toContain('68.800');
  });

  it('lists each issue of a refused file with its line and column', async () => {
    await show([item(1, 'broken.csv', { preview: badPreview, message: '1 issue(s) found' })]);
    expect(text()).toContain('Line 12, column 9: Fx is not a number');
    expect(text()).toContain('cannot be used as it is');
  });

  it('links a duplicate to the run that already holds the file', async () => {
    await show([item(1, 'again.csv', { phase: 'duplicate', message: 'This exact file is already stored.', existingRunId: 'run-7' })]);
    const link = (fixture.nativeElement as HTMLElement).querySelector('a');
    expect(link?.getAttribute('href')).toBe('/runs/run-7');
    expect(text()).toContain('Already uploaded');
  });

  it('lets a waiting file be removed but not one that is being sent', async () => {
    await show([item(1, 'waiting.csv', {}), item(2, 'sending.csv', { phase: 'uploading', progress: 0.5 })]);
    const removed: number[] = [];
    fixture.componentInstance.remove.subscribe((key) => removed.push(key));
    expect(await loader.getAllHarnesses(MatButtonHarness.with({ selector: '[aria-label^="Remove"]' }))).toHaveLength(1);
    await (await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Remove waiting.csv"]' }))).click();
    expect(removed).toEqual([1]);
  });

  it('follows a stored file’s reduction until it is done', async () => {
    // Not `show`: the poll keeps the fixture busy until the first answer arrives.
    fixture.componentRef.setInput('items', [item(1, 'sweep.csv', { phase: 'stored', progress: 1, reductionId: 'red-1' })]);
    fixture.detectChanges();
    let request: TestRequest | undefined;
    await vi.waitFor(() => {
      request ??= backend.match('/api/reductions/red-1')[0];
      expect(request).toBeDefined();
    });
    request?.flush({ id: 'red-1', version: 1, state: 'done', progress: 1, pointCount: 21, error: null });
    await fixture.whenStable();
    expect(text()).toContain('Reduction v1: Reduced, 21 points');
    backend.verify();
  });
});
