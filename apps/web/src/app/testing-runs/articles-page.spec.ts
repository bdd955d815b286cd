import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { MatSnackBarHarness } from '@angular/material/snack-bar/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import type { Article, Organisation } from '@tunnelwright/contracts';
import { ArticlesPage } from './articles-page';

const lab: Organisation = { id: '0f1e2d3c-4b5a-4968-8776-655443322110', name: 'The laboratory (invented)', kind: 'lab' };
const ashgrove: Organisation = { id: '3c4d5e6f-7a8b-4c9d-8e0f-1a2b3c4d5e6f', name: 'Ashgrove Coachworks (invented)', kind: 'customer' };
const pellow: Organisation = { id: '4d5e6f7a-8b9c-4d0e-9f1a-2b3c4d5e6f7a', name: 'Pellow Kites (invented)', kind: 'customer' };

function article(index: number, organisation: Organisation, name: string): Article {
  return {
    id: `00000000-0000-4000-8000-${String(index).padStart(12, '0')}`,
    organisationId: organisation.id,
    name,
    description: '',
    kind: index === 1 ? 'road_vehicle' : 'sports_equipment',
    conditionOnReceipt: '',
    receivedOn: null,
    referenceArea: 0.0884,
    referenceAreaKind: 'frontal',
    referenceLength: 0.82,
    volume: 0,
    frontalArea: null,
    momentCentre: { x: 0, y: 0, z: 0 },
    scale: 5,
    createdAt: '2026-11-20T09:00:00.000Z',
    updatedAt: '2026-11-20T09:00:00.000Z',
  };
}

const hatchback = article(1, ashgrove, 'Hatchback model, 1:5 (invented)');
const kite = article(2, pellow, 'Foil kite, full size (invented)');

describe('ArticlesPage', () => {
  let fixture: ComponentFixture<ArticlesPage>;
  let loader: HarnessLoader;
  let backend: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [ArticlesPage], providers: [provideHttpClient(), provideHttpClientTesting()] });
    fixture = TestBed.createComponent(ArticlesPage);
    loader = TestbedHarnessEnvironment.documentRootLoader(fixture);
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    backend.expectOne('/api/organisations').flush([lab, ashgrove, pellow]);
    backend.expectOne('/api/articles').flush([hatchback, kite]);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  /** The dialog hands back its answer once its closing animation ends, so the request comes a little later. */
  async function awaitRequest(method: string, url: string) {
    for (let tries = 0; tries < 100; tries++) {
      const [found] = backend.match({ method, url });
      if (found) return found;
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    return backend.expectOne({ method, url });
  }

  const table = () => loader.getHarness(MatTableHarness.with({ selector: '[aria-label="Test articles"]' }));

  it("lists every customer's articles with their organisation, kind and scale, and filters by organisation", async () => {
    const cells = await (await table()).getCellTextByColumnName();
    expect(cells['name'].text).toEqual([hatchback.name, kite.name]);
    expect(cells['organisation'].text).toEqual([ashgrove.name, pellow.name]);
    expect(cells['kind'].text).toEqual(['Road vehicle', 'Sports equipment']);
    expect(cells['scale'].text).toEqual(['5', '5']);

    const filter = await loader.getHarness(MatSelectHarness);
    await filter.open();
    expect((await filter.getOptions()).length).toBe(3);
    const select = filter.clickOptions({ text: pellow.name });
    (await awaitRequest('GET', `/api/articles?organisationId=${pellow.id}`)).flush([kite]);
    await select;
    expect((await (await table()).getCellTextByColumnName())['name'].text).toEqual([kite.name]);
  });

  it("asks before removing and shows the server's reason when a test still uses the article", async () => {
    await (await loader.getHarness(MatButtonHarness.with({ selector: `[aria-label="Remove ${hatchback.name}"]` }))).click();
    const dialog = await loader.getHarness(MatDialogHarness);
    expect(await dialog.getText()).toContain('An article that a test uses cannot be removed');
    await (await dialog.getHarness(MatButtonHarness.with({ text: 'Remove' }))).click();
    (await awaitRequest('DELETE', `/api/articles/${hatchback.id}`)).flush({ title: 'Article in use', status: 409, detail: 'Tests refer to this article, so it is kept for their records.' }, { status: 409, statusText: 'Conflict' });
    await fixture.whenStable();
    expect(await (await loader.getHarness(MatSnackBarHarness)).getMessage()).toBe('Tests refer to this article, so it is kept for their records.');
  });

  it('removes an unused article after confirming and reloads the list', async () => {
    await (await loader.getHarness(MatButtonHarness.with({ selector: `[aria-label="Remove ${kite.name}"]` }))).click();
    await (await (await loader.getHarness(MatDialogHarness)).getHarness(MatButtonHarness.with({ text: 'Remove' }))).click();
    (await awaitRequest('DELETE', `/api/articles/${kite.id}`)).flush(null, { status: 204, statusText: 'No Content' });
    (await awaitRequest('GET', '/api/articles')).flush([hatchback]);
    await fixture.whenStable();
    expect(await (await loader.getHarness(MatSnackBarHarness)).getMessage()).toBe(`${kite.name} removed.`);
    expect((await (await table()).getCellTextByColumnName())['name'].text).toEqual([hatchback.name]);
  });
});
