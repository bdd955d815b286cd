import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import type { AuditEntry } from '@tunnelwright/contracts';
import { AuditEntriesTable, type AuditOpening, type AuditTextColumn } from './audit-entries-table';

const renamed: AuditEntry = {
  id: '6f1d2c1e-8a4b-4d7e-9c3a-1b2c3d4e5f60',
  actorId: '0a9b8c7d-6e5f-4a3b-8c2d-1e0f9a8b7c6d',
  actorName: 'Petra Ilves',
  action: 'tunnel.updated',
  entity: 'tunnel',
  entityId: 'd4c3b2a1-0f9e-4d8c-b7a6-5f4e3d2c1b0a',
  before: { name: 'Low-speed loop' },
  after: { name: 'Low-speed loop A' },
  createdAt: '2026-11-30T09:15:00.000Z',
};
const nightly: AuditEntry = {
  id: '7a2e3d2f-9b5c-4e8f-8d4b-2c3d4e5f6a71',
  actorId: null,
  actorName: null,
  action: 'invitation.expired',
  entity: 'invitation',
  entityId: null,
  before: null,
  after: null,
  createdAt: '2026-11-30T02:00:00.000Z',
};

/** A host that lists entries with two columns of words, as the audit log and a test's trail do. */
@Component({
  selector: 'tw-audit-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [AuditEntriesTable],
  template: `<tw-audit-entries-table [entries]="entries" label="Changes to tunnels" [textColumns]="columns" [opens]="opens()" />`,
})
class AuditHost {
  readonly opens = input<AuditOpening>('change');
  readonly entries = [renamed, nightly];
  readonly columns: readonly AuditTextColumn[] = [
    { name: 'action', header: 'Action', text: (entry) => entry.action },
    { name: 'entity', header: 'Record', text: (entry) => entry.entity, keepsLines: true },
  ];
}

describe('AuditEntriesTable', () => {
  let fixture: ComponentFixture<AuditHost>;

  async function render(opens: AuditOpening) {
    fixture = TestBed.createComponent(AuditHost);
    fixture.componentRef.setInput('opens', opens);
    await fixture.whenStable();
    const loader = TestbedHarnessEnvironment.loader(fixture);
    return { loader, table: await loader.getHarness(MatTableHarness) };
  }

  it('names the table and lists when, who and the host columns, with System for entries nobody made', async () => {
    const { table } = await render('change');
    expect((fixture.nativeElement as HTMLElement).querySelector('table')?.getAttribute('aria-label')).toBe('Changes to tunnels');
    const [header] = await table.getHeaderRows();
    expect(await header?.getCellTextByIndex()).toEqual(['When', 'Who', 'Action', 'Record', 'Details']);
    const rows = await table.getRows();
    const texts = await Promise.all(rows.map((row) => row.getCellTextByColumnName()));
    const listed = texts.filter((cells) => cells['createdAt'] !== undefined);
    expect(listed.map((cells) => [cells['actor'], cells['action'], cells['entity']])).toEqual([
      ['Petra Ilves', 'tunnel.updated', 'tunnel'],
      ['System', 'invitation.expired', 'invitation'],
    ]);
    const host = fixture.nativeElement as HTMLElement;
    expect(host.querySelectorAll('td.keeps-lines')).toHaveLength(2);
  });

  it('opens the change of an entry that stored one, before beside after, and closes it again', async () => {
    const { loader } = await render('change');
    const buttons = await loader.getAllHarnesses(MatButtonHarness);
    // Only the renamed tunnel stored a record; the expiry has nothing to open.
    expect(buttons).toHaveLength(1);
    const [show] = buttons;
    expect(await show?.getText()).toBe('Show change');
    expect(await (await show?.host())?.getAttribute('aria-expanded')).toBe('false');

    await show?.click();
    const host = fixture.nativeElement as HTMLElement;
    expect(await show?.getText()).toBe('Hide change');
    expect(await (await show?.host())?.getAttribute('aria-expanded')).toBe('true');
    const panes = [...host.querySelectorAll('.change > div')].map((pane) => [
      pane.querySelector('strong')?.textContent,
      pane.querySelector('pre')?.textContent?.replace(/\s+/g, ' ').trim(),
    ]);
    expect(panes).toEqual([
      ['Before', '{ "name": "Low-speed loop" }'],
      ['After', '{ "name": "Low-speed loop A" }'],
    ]);

    await show?.click();
    expect(await show?.getText()).toBe('Show change');
    expect(host.querySelector('.change')).toBeNull();
  });

  it('opens only the record as the act left it when asked to show records', async () => {
    const { table, loader } = await render('record');
    const [header] = await table.getHeaderRows();
    expect(await header?.getCellTextByIndex()).toEqual(['When', 'Who', 'Action', 'Record', 'Record']);
    const show = await loader.getHarness(MatButtonHarness.with({ text: 'Show record' }));
    await show.click();
    expect(await show.getText()).toBe('Hide record');
    const host = fixture.nativeElement as HTMLElement;
    expect(host.querySelector('.change')).toBeNull();
    expect(host.querySelector('pre')?.textContent?.replace(/\s+/g, ' ').trim()).toBe('{ "name": "Low-speed loop A" }');
  });
});
