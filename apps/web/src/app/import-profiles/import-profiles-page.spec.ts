import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { provideRouter } from '@angular/router';
import type { SavedImportProfile } from '@tunnelwright/contracts';
import { ImportProfilesPage } from './import-profiles-page';

const logger: SavedImportProfile = {
  id: '2c4e6a8b-1d3f-4a5b-9c7d-8e0f1a2b3c4d',
  name: 'Semicolon logger (invented)',
  description: 'Bench logger files',
  profile: { name: 'Semicolon logger (invented)', delimiter: ';', decimalComma: true, unitsRow: true, columns: [{ source: 'qinf', channel: 'q', drop: false }] },
  createdBy: '3d5f7b9c-2e4a-4b6c-8d8e-9f1a2b3c4d5e',
  archived: false,
  createdAt: '2026-12-02T09:00:00.000Z',
  updatedAt: '2026-12-02T09:00:00.000Z',
};

describe('ImportProfilesPage', () => {
  let fixture: ComponentFixture<ImportProfilesPage>;
  let backend: HttpTestingController;

  async function open(profiles: SavedImportProfile[]): Promise<HTMLElement> {
    TestBed.configureTestingModule({ imports: [ImportProfilesPage], providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])] });
    fixture = TestBed.createComponent(ImportProfilesPage);
    backend = TestBed.inject(HttpTestingController);
    // Not whenStable: the list's load is a pending task until it is flushed.
    TestBed.tick();
    backend.expectOne('/api/import-profiles').flush(profiles);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  afterEach(() => backend.verify());

  it('explains what a profile is for when the lab has none', async () => {
    const host = await open([]);
    expect(host.textContent).toContain('No import profiles yet');
    expect(host.textContent).toContain('When an instrument or another lab writes its files differently');
  });

  it('lists each profile with what it changes', async () => {
    const host = await open([logger]);
    expect(host.querySelector('table')?.textContent).toContain('semicolon between fields · decimal comma · units in their own row · renames 1 column(s)');
  });

  it('archives a profile only after the confirmation', async () => {
    await open([logger]);
    const loader = TestbedHarnessEnvironment.loader(fixture);
    const overlays = TestbedHarnessEnvironment.documentRootLoader(fixture);
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Archive' }))).click();
    await (await overlays.getHarness(MatDialogHarness)).close();
    // The dialog reports its answer once its closing is done.
    await vi.waitFor(async () => expect(await overlays.getAllHarnesses(MatDialogHarness)).toHaveLength(0));
    backend.expectNone(`/api/import-profiles/${logger.id}/archive`);

    await (await loader.getHarness(MatButtonHarness.with({ text: 'Archive' }))).click();
    const dialog = await overlays.getHarness(MatDialogHarness);
    expect(await dialog.getContentText()).toContain('Reductions that used it keep the copy they were read with.');
    await (await dialog.getHarness(MatButtonHarness.with({ text: 'Archive' }))).click();
    const archive = await vi.waitFor(() => backend.expectOne(`/api/import-profiles/${logger.id}/archive`));
    expect(archive.request.method).toBe('POST');
    archive.flush({ ...logger, archived: true });
    TestBed.tick();
    // The list loads again without the archived profile.
    (await vi.waitFor(() => backend.expectOne('/api/import-profiles'))).flush([]);
    await fixture.whenStable();
  }, 30_000);
});
