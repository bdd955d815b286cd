import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { Router, provideRouter } from '@angular/router';
import type { Article, Balance, Organisation, Test, Tunnel } from '@tunnelwright/contracts';
import { TestFormPage } from './test-form-page';
import { testInputFrom, uniqueLabels } from './test-form';

const lab: Organisation = { id: '0f1e2d3c-4b5a-4968-8776-655443322110', name: 'The laboratory (invented)', kind: 'lab' };
const customer: Organisation = { id: '3c4d5e6f-7a8b-4c9d-8e0f-1a2b3c4d5e6f', name: 'Ashgrove Coachworks (invented)', kind: 'customer' };
const article = { id: '5e6f7a8b-9c0d-4e1f-8a2b-3c4d5e6f7a8b', organisationId: customer.id, name: 'Hatchback model, 1:5 (invented)' } as Article;
const tunnel = { id: '6f7a8b9c-0d1e-4f2a-9b3c-4d5e6f7a8b9c', name: 'Closed-section tunnel (invented)' } as Tunnel;
const balance = { id: '7a8b9c0d-1e2f-4a3b-8c4d-5e6f7a8b9c0d', identifier: 'SG-6 (invented)' } as Balance;

const saved: Test = {
  id: '8b9c0d1e-2f3a-4b4c-9d5e-6f7a8b9c0d1e',
  organisationId: customer.id,
  articleId: article.id,
  tunnelId: tunnel.id,
  balanceId: balance.id,
  bookingId: null,
  title: 'Hatchback drag at yaw (invented)',
  state: 'running',
  configurations: [{ label: 'baseline', description: 'as delivered' }],
  reductionSettings: { densityModel: 'cipm-2007', minimumSamplesPerPoint: 50 },
  createdAt: '2026-11-20T09:00:00.000Z',
  updatedAt: '2026-11-20T09:00:00.000Z',
};

describe('uniqueLabels and testInputFrom', () => {
  it('ignores case and surrounding spaces when comparing labels', async () => {
    const { FormBuilder } = await import('@angular/forms');
    const fb = new FormBuilder().nonNullable;
    const { configurationRow } = await import('./test-form');
    const rows = fb.array([configurationRow(fb, 'Baseline'), configurationRow(fb, ' baseline ')]);
    expect(uniqueLabels(rows)).toEqual({ duplicateLabel: 'baseline' });
    rows.at(1).controls.label.setValue('mirrors off');
    expect(uniqueLabels(rows)).toBeNull();
  });

  it('keeps the reduction settings the form does not show and drops an emptied minimum', async () => {
    const { FormBuilder } = await import('@angular/forms');
    const { buildTestForm } = await import('./test-form');
    const form = buildTestForm(new FormBuilder().nonNullable, saved);
    form.controls.minimumSamplesPerPoint.setValue(null);
    expect(testInputFrom(form, saved).reductionSettings).toEqual({ densityModel: 'cipm-2007' });
  });
});

describe('TestFormPage', () => {
  let fixture: ComponentFixture<TestFormPage>;
  let loader: HarnessLoader;
  let backend: HttpTestingController;
  let flusher: ReturnType<typeof setInterval> | undefined;
  /** The customers whose articles the page asked for, in order. */
  let articleQueries: (string | null)[];

  async function start(id?: string, query: { organisation?: string; tunnel?: string } = {}): Promise<void> {
    TestBed.configureTestingModule({ imports: [TestFormPage], providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    fixture = TestBed.createComponent(TestFormPage);
    if (id) fixture.componentRef.setInput('id', id);
    if (query.organisation) fixture.componentRef.setInput('organisation', query.organisation);
    if (query.tunnel) fixture.componentRef.setInput('tunnel', query.tunnel);
    loader = TestbedHarnessEnvironment.documentRootLoader(fixture);
    backend = TestBed.inject(HttpTestingController);
    // The page asks for a customer's articles as soon as one is chosen; the harness waits for that answer.
    articleQueries = [];
    flusher = setInterval(() => {
      for (const request of backend.match('/api/articles?organisationId=' + customer.id)) {
        articleQueries.push(request.request.params.get('organisationId'));
        request.flush([article]);
      }
    }, 5);
    fixture.detectChanges();
    backend.expectOne('/api/organisations').flush([lab, customer]);
    backend.expectOne('/api/tunnels').flush([tunnel]);
    backend.expectOne('/api/balances').flush([balance]);
    if (id) backend.expectOne(`/api/tests/${id}`).flush(saved);
    await fixture.whenStable();
  }

  afterEach(() => {
    clearInterval(flusher);
    backend.verify();
  });

  const field = (label: string) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
  const select = async (label: string) => (await field(label)).getControl(MatSelectHarness);
  const button = async (text: string | RegExp) => loader.getHarness(MatButtonHarness.with({ text }));

  it('offers customers only and the articles of the chosen customer', async () => {
    await start();
    const organisations = await select('Customer organisation');
    await organisations?.open();
    expect((await organisations?.getOptions())?.length).toBe(1);
    await organisations?.clickOptions({ text: customer.name });
    expect(articleQueries).toEqual([customer.id]);
    const articles = await select('Test article');
    await articles?.open();
    await articles?.clickOptions({ text: article.name });
    expect(await articles?.getValueText()).toBe(article.name);
  });

  it('opened from a booking, starts with its customer and tunnel and offers that customer’s articles', async () => {
    await start(undefined, { organisation: customer.id, tunnel: tunnel.id });
    expect(await (await select('Customer organisation'))?.getValueText()).toBe(customer.name);
    expect(await (await select('Tunnel'))?.getValueText()).toContain(tunnel.name);
    expect(articleQueries).toEqual([customer.id]);
  });

  it('names what is missing, refuses a repeated configuration label and sends nothing', async () => {
    await start();
    await (await button(/Add a configuration/)).click();
    await (await button(/Add a configuration/)).click();
    const labels = await loader.getAllHarnesses(MatInputHarness.with({ selector: '[formControlName="label"]' }));
    await labels[0]?.setValue('baseline');
    await labels[1]?.setValue('Baseline');
    await (await button('Open test')).click();
    expect(await (await field('Title')).getTextErrors()).toEqual(['Enter a title']);
    expect(await (await field('Customer organisation')).getTextErrors()).toEqual(['Choose the customer organisation']);
    expect(await (await field('Test article')).getTextErrors()).toEqual(['Choose the test article']);
    expect(await (await field('Tunnel')).getTextErrors()).toEqual(['Choose the tunnel']);
    expect(fixture.nativeElement.querySelector('[role="alert"]').textContent).toContain('Two configurations are labelled "baseline"');
    backend.expectNone('/api/tests');
  });

  it('adds and removes configuration rows, opens the test as planned and goes to its page', async () => {
    await start();
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    await (await field('Title')).getControl(MatInputHarness).then((input) => input?.setValue('Hatchback drag at yaw (invented)'));
    await (await select('Customer organisation'))?.clickOptions({ text: customer.name });
    await (await select('Test article'))?.clickOptions({ text: article.name });
    await (await select('Tunnel'))?.clickOptions({ text: tunnel.name });
    for (let i = 0; i < 3; i++) await (await button(/Add a configuration/)).click();
    const labels = await loader.getAllHarnesses(MatInputHarness.with({ selector: '[formControlName="label"]' }));
    await labels[0]?.setValue('baseline');
    await labels[1]?.setValue('spare');
    await labels[2]?.setValue('mirrors off');
    await (await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Remove configuration 2"]' }))).click();
    await (await field('Minimum samples per point')).getControl(MatInputHarness).then((input) => input?.setValue('1.5'));
    await (await button('Open test')).click();
    expect(await (await field('Minimum samples per point')).getTextErrors()).toEqual(['Use a whole number of 1 or more']);
    backend.expectNone('/api/tests');
    await (await field('Minimum samples per point')).getControl(MatInputHarness).then((input) => input?.setValue(''));
    await (await button('Open test')).click();

    const request = backend.expectOne('/api/tests');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({
      organisationId: customer.id,
      articleId: article.id,
      tunnelId: tunnel.id,
      balanceId: null,
      title: 'Hatchback drag at yaw (invented)',
      state: 'planned',
      configurations: [
        { label: 'baseline', description: '' },
        { label: 'mirrors off', description: '' },
      ],
      reductionSettings: {},
    });
    request.flush({ ...saved, id: '9c0d1e2f-3a4b-4c5d-8e6f-7a8b9c0d1e2f' });
    expect(navigate).toHaveBeenCalledWith(['/tests', '9c0d1e2f-3a4b-4c5d-8e6f-7a8b9c0d1e2f']);
  });

  it("edits a test: prefilled from the saved test, sent with PUT, the server's errors on the right row", async () => {
    await start(saved.id);
    expect(articleQueries).toEqual([customer.id]);
    expect(await (await field('Title')).getControl(MatInputHarness).then((input) => input?.getValue())).toBe(saved.title);
    expect(await (await select('Test article'))?.getValueText()).toBe(article.name);
    expect(await (await select('Balance'))?.getValueText()).toBe(balance.identifier);
    expect(await (await select('State'))?.getValueText()).toBe('Under way');
    expect(await (await field('Minimum samples per point')).getControl(MatInputHarness).then((input) => input?.getValue())).toBe('50');

    await (await button('Save changes')).click();
    const request = backend.expectOne(`/api/tests/${saved.id}`);
    expect(request.request.method).toBe('PUT');
    expect(request.request.body).toMatchObject({ state: 'running', reductionSettings: { densityModel: 'cipm-2007', minimumSamplesPerPoint: 50 } });
    request.flush(
      { title: 'Invalid request', status: 400, detail: 'Check the highlighted fields.', errors: [{ field: 'configurations.0.label', message: 'Too long for a label' }, { field: 'tunnelId', message: 'Choose a tunnel in service' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(await (await field('Label')).getTextErrors()).toEqual(['Too long for a label']);
    expect(await (await field('Tunnel')).getTextErrors()).toEqual(['Choose a tunnel in service']);
  });
});
