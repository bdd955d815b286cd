import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { Article } from '@tunnelwright/contracts';
import { ArticleDialog, type ArticleDialogData } from './article-dialog';

const customer = { id: '3c4d5e6f-7a8b-4c9d-8e0f-1a2b3c4d5e6f', name: 'Ashgrove Coachworks (invented)', kind: 'customer' as const };
const other = { id: '4d5e6f7a-8b9c-4d0e-9f1a-2b3c4d5e6f7a', name: 'Pellow Kites (invented)', kind: 'customer' as const };

const saved: Article = {
  id: '5e6f7a8b-9c0d-4e1f-8a2b-3c4d5e6f7a8b',
  organisationId: customer.id,
  name: 'Hatchback model, 1:5 (invented)',
  description: '',
  kind: 'road_vehicle',
  conditionOnReceipt: 'Front splitter cracked; glued before testing.',
  receivedOn: null,
  referenceArea: 0.0884,
  referenceAreaKind: 'frontal',
  referenceLength: 0.82,
  volume: 0.06,
  frontalArea: null,
  momentCentre: { x: 0.41, y: 0, z: 0 },
  scale: 5,
  createdAt: '2026-11-20T09:00:00.000Z',
  updatedAt: '2026-11-20T09:00:00.000Z',
};

async function openDialog(data: ArticleDialogData) {
  const close = vi.fn();
  TestBed.configureTestingModule({
    imports: [ArticleDialog],
    providers: [provideHttpClient(), provideHttpClientTesting(), { provide: MAT_DIALOG_DATA, useValue: data }, { provide: MatDialogRef, useValue: { close } }],
  });
  const fixture = TestBed.createComponent(ArticleDialog);
  const loader = TestbedHarnessEnvironment.loader(fixture);
  await fixture.whenStable();
  return { close, loader, backend: TestBed.inject(HttpTestingController) };
}

describe('ArticleDialog', () => {
  let loader: HarnessLoader;
  let backend: HttpTestingController;
  let close: ReturnType<typeof vi.fn>;

  const field = (label: string) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
  const input = async (label: string) => (await field(label)).getControl(MatInputHarness);
  const record = async () => (await loader.getHarness(MatButtonHarness.with({ text: 'Record article' }))).click();

  describe('a new article', () => {
    beforeEach(async () => {
      ({ close, loader, backend } = await openDialog({ article: null, customers: [customer, other], organisationId: customer.id }));
    });
    afterEach(() => backend.verify());

    it('shows SI units in the labels and says what the scale means', async () => {
      for (const label of ['Reference area (m²)', 'Reference length (m)', 'Frontal area (m²)', 'Volume (m³)', 'Moment centre x (m)']) {
        expect(await (await field(label)).getLabel()).toBe(label);
      }
      expect(await (await field('Scale')).getTextHints()).toEqual(['Full-scale length ÷ model length: 4 for a 1:4 model, 1 for full size']);
    });

    it('names each missing or impossible value and sends nothing', async () => {
      await (await input('Scale'))?.setValue('0');
      await (await input('Volume (m³)'))?.setValue('-0.1');
      await (await input('Frontal area (m²)'))?.setValue('-1');
      await record();
      expect(await (await field('Name')).getTextErrors()).toEqual(['Enter a name']);
      expect(await (await field('Reference area (m²)')).getTextErrors()).toEqual(['Enter the reference area']);
      expect(await (await field('Reference length (m)')).getTextErrors()).toEqual(['Enter the reference length']);
      expect(await (await field('Scale')).getTextErrors()).toEqual(['Scale must be greater than zero']);
      expect(await (await field('Volume (m³)')).getTextErrors()).toEqual(['Volume cannot be negative']);
      expect(await (await field('Frontal area (m²)')).getTextErrors()).toEqual(['Frontal area must be greater than zero']);
      backend.expectNone('/api/articles');
    });

    it('sends the article in SI units with its moment centre and closes with the answer', async () => {
      await (await input('Name'))?.setValue('Hatchback model, 1:5 (invented)');
      await (await input('Condition on receipt'))?.setValue('Front splitter cracked; glued before testing.');
      await (await input('Received on'))?.setValue('2026-11-20');
      await (await input('Reference area (m²)'))?.setValue('0.0884');
      await (await input('Reference length (m)'))?.setValue('0.82');
      await (await input('Volume (m³)'))?.setValue('0.06');
      await (await input('Scale'))?.setValue('5');
      await (await input('Moment centre x (m)'))?.setValue('0.41');
      await record();
      const request = backend.expectOne('/api/articles');
      expect(request.request.method).toBe('POST');
      expect(request.request.body).toEqual({
        organisationId: customer.id,
        name: 'Hatchback model, 1:5 (invented)',
        kind: 'road_vehicle',
        description: '',
        conditionOnReceipt: 'Front splitter cracked; glued before testing.',
        receivedOn: '2026-11-20',
        referenceArea: 0.0884,
        referenceAreaKind: 'frontal',
        referenceLength: 0.82,
        frontalArea: null,
        volume: 0.06,
        scale: 5,
        momentCentre: { x: 0.41, y: 0, z: 0 },
      });
      request.flush(saved);
      expect(close).toHaveBeenCalledWith(saved);
    });

    it("puts the server's field errors on their fields, the moment centre's on its axis", async () => {
      await (await input('Name'))?.setValue('Kite spar, full size (invented)');
      await (await input('Reference area (m²)'))?.setValue('0.3');
      await (await input('Reference length (m)'))?.setValue('1.2');
      await record();
      backend.expectOne('/api/articles').flush(
        { title: 'Invalid request', status: 400, detail: 'Check the highlighted fields.', errors: [{ field: 'organisationId', message: 'Choose a customer organisation' }, { field: 'momentCentre.z', message: 'z must be a number' }] },
        { status: 400, statusText: 'Bad Request' },
      );
      expect(await (await field('Customer organisation')).getTextErrors()).toEqual(['Choose a customer organisation']);
      expect(await (await field('Moment centre z (m)')).getTextErrors()).toEqual(['z must be a number']);
      expect(close).not.toHaveBeenCalled();
    });
  });

  describe('an existing article', () => {
    beforeEach(async () => {
      ({ close, loader, backend } = await openDialog({ article: saved, customers: [customer, other], organisationId: '' }));
    });
    afterEach(() => backend.verify());

    it('is filled in and saved with PUT', async () => {
      expect(await (await input('Reference area (m²)'))?.getValue()).toBe('0.0884');
      expect(await (await loader.getHarness(MatSelectHarness.with({ selector: '[formControlName="organisationId"]' }))).getValueText()).toBe(customer.name);
      await (await input('Scale'))?.setValue('4');
      await (await loader.getHarness(MatButtonHarness.with({ text: 'Save changes' }))).click();
      const request = backend.expectOne(`/api/articles/${saved.id}`);
      expect(request.request.method).toBe('PUT');
      expect(request.request.body).toMatchObject({ scale: 4, momentCentre: { x: 0.41, y: 0, z: 0 } });
      request.flush({ ...saved, scale: 4 });
      expect(close).toHaveBeenCalledOnce();
    });
  });

  it('keeps the organisation fixed when recorded while opening a test for that customer', async () => {
    ({ close, loader, backend } = await openDialog({ article: null, customers: [customer, other], organisationId: other.id, organisationFixed: true }));
    const select = await loader.getHarness(MatSelectHarness.with({ selector: '[formControlName="organisationId"]' }));
    expect(await select.isDisabled()).toBe(true);
    expect(await select.getValueText()).toBe(other.name);
    backend.verify();
  });
});
