import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatChipHarness } from '@angular/material/chips/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import type { ReviewPoint, ReviewRun } from '@tunnelwright/contracts';
import { ReviewPointsTable } from './review-points-table';
import { reviewPoint, reviewRun, sampleExclusion } from './review-test-data';

describe('ReviewPointsTable', () => {
  let fixture: ComponentFixture<ReviewPointsTable>;
  let loader: HarnessLoader;
  const run = reviewRun(4, [
    reviewPoint(0, 0, 0.31234, 0.00412, { warnings: [{ code: 'FEW_SAMPLES', message: 'point 1: 3 samples, fewer than the configured minimum of 5' }] }),
    reviewPoint(1, 5, 0.32, 0.004, { exclusion: sampleExclusion }),
  ]);

  const show = async (shown: ReviewRun, canExclude: boolean) => {
    TestBed.configureTestingModule({ imports: [ReviewPointsTable] });
    fixture = TestBed.createComponent(ReviewPointsTable);
    loader = TestbedHarnessEnvironment.loader(fixture);
    fixture.componentRef.setInput('run', shown);
    fixture.componentRef.setInput('canExclude', canExclude);
    await fixture.whenStable();
  };

  it('lists C_D ± U, warning chips, and an excluded point struck through with its reason', async () => {
    await show(run, true);
    const table = await loader.getHarness(MatTableHarness);
    const rows = await table.getRows();
    expect(rows).toHaveLength(2);
    const first = await rows[0].getCellTextByColumnName();
    expect(first['cd']).toBe('0.3123 ± 0.0041');
    expect(first['counts']).toBe('3,123.4');
    const chips = await loader.getAllHarnesses(MatChipHarness);
    expect(await Promise.all(chips.map((chip) => chip.getText()))).toEqual(['FEW_SAMPLES', 'Excluded: Probe touched the model']);
    const rowElements = fixture.nativeElement.querySelectorAll('tr.mat-mdc-row');
    expect(rowElements[1].classList).toContain('excluded-row');
    expect(rowElements[0].classList).not.toContain('excluded-row');
  });

  it('offers Exclude on a kept point and Restore on an excluded one, emitting the point', async () => {
    await show(run, true);
    const excluded: ReviewPoint[] = [];
    const restored: ReviewPoint[] = [];
    fixture.componentInstance.exclude.subscribe((p) => excluded.push(p));
    fixture.componentInstance.restore.subscribe((p) => restored.push(p));
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Exclude…' }))).click();
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Restore' }))).click();
    expect(excluded.map((p) => p.index)).toEqual([0]);
    expect(restored.map((p) => p.index)).toEqual([1]);
  });

  it('is read-only for an approved version and for anyone who may not exclude', async () => {
    const frozen: ReviewRun = { ...run, selected: run.selected ? { ...run.selected, frozen: true } : null };
    await show(frozen, true);
    expect(await loader.getAllHarnesses(MatButtonHarness)).toHaveLength(0);
    expect(fixture.nativeElement.textContent).toContain('This version is approved');
    TestBed.resetTestingModule();
    await show(run, false);
    expect(await loader.getAllHarnesses(MatButtonHarness)).toHaveLength(0);
  });
});
