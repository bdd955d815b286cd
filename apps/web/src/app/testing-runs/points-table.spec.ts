import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatChipHarness } from '@angular/material/chips/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import type { ReducedPoint } from './ingest-api';
import { PointsTable } from './points-table';

function point(pointNumber: number, yaw: number, cd: number, expanded: number | null): ReducedPoint {
  return {
    index: pointNumber - 1,
    pointNumber,
    sampleCount: 40,
    yaw,
    pitch: 0,
    dynamicPressure: 1509.07,
    speed: 50.12,
    reynoldsNumber: 1.2e6,
    cdUncorrected: cd + 0.01,
    cdCorrected: cd,
    clCorrected: 0.1,
    csCorrected: -0.2,
    dragCounts: cd * 1e4,
    result: expanded === null ? {} : { corrected: { dragCoefficient: { value: cd, uncertainty: { expandedUncertainty: expanded } } } },
  };
}

describe('PointsTable', () => {
  let fixture: ComponentFixture<PointsTable>;
  let loader: HarnessLoader;

  beforeEach(() => {
    TestBed.configureTestingModule({ imports: [PointsTable] });
    fixture = TestBed.createComponent(PointsTable);
    loader = TestbedHarnessEnvironment.loader(fixture);
  });

  const show = async (points: ReducedPoint[], warnings: Record<string, unknown>[] = []) => {
    fixture.componentRef.setInput('points', points);
    fixture.componentRef.setInput('warnings', warnings);
    await fixture.whenStable();
  };

  it('shows the coefficients, U (k = 2) and drag counts of each point', async () => {
    await show([point(1, -10, 0.3312, 0.0041), point(2, 0, 0.3105, null)]);
    const table = await loader.getHarness(MatTableHarness);
    const rows = await table.getCellTextByColumnName();
    expect(rows['point'].text).toEqual(['1', '2']);
    expect(rows['yaw'].text).toEqual(['-10.00', '0.00']);
    expect(rows['cdCorrected'].text).toEqual(['0.3312', '0.3105']);
    expect(rows['cdUncertainty'].text).toEqual(['±0.0041', '—']);
    expect(rows['dragCounts'].text).toEqual(['3,312.0', '3,105.0']);
  });

  it('puts a warning chip on the row of the point it names', async () => {
    await show([point(1, -10, 0.33, 0.004), point(2, 0, 0.31, 0.004)], [{ code: 'FEW_SAMPLES', point: 2, message: 'point 2: 3 samples, fewer than the configured minimum of 10' }]);
    const chips = await loader.getAllHarnesses(MatChipHarness);
    expect(chips).toHaveLength(1);
    expect(await chips[0].getText()).toBe('FEW_SAMPLES');
    const table = await loader.getHarness(MatTableHarness);
    const rows = await table.getCellTextByColumnName();
    expect(rows['warnings'].text).toEqual(['', 'FEW_SAMPLES']);
  });

  it('says so when a version has no points', async () => {
    await show([]);
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('No points in this version.');
  });
});
