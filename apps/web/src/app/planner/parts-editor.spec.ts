import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormArray } from '@angular/forms';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { ShapeInfo } from '@tunnelwright/contracts';
import { PartsEditor } from './parts-editor';
import { buildPartForm, type PartForm } from './plan-form';
import { shapeFixture, sphereFixture } from './testing/shape-fixtures';

const source = { citation: 'Invented handbook of drag, table 1', corroboration: null };
const shapes: ShapeInfo[] = [
  shapeFixture({
    id: 'circular-cylinder-cross-flow',
    label: 'Circular cylinder in cross-flow',
    kind: '2-d',
    family: 'circular-cylinder',
    orientation: 'cross-flow',
    dragCoefficient: { curve: 'cylinder' },
    referenceArea: { basis: 'frontal', formula: 'length × diameter', dimensions: ['length', 'diameter'] },
    characteristicLength: { dimension: 'diameter', description: 'cylinder diameter' },
    source,
  }),
  sphereFixture(source.citation),
  shapeFixture(
    {
      id: 'person-standing',
      label: 'Person standing',
      kind: 'object',
      family: 'person',
      orientation: 'standing',
      dragCoefficient: 1.2,
      referenceArea: { basis: 'frontal', formula: 'frontal area as measured or estimated for the object', dimensions: ['frontalArea'] },
      characteristicLength: null,
      source,
    },
    { typicalFrontalArea: 0.55, fromMemory: true },
  ),
];

@Component({
  imports: [PartsEditor],
  template: `<tw-parts-editor [parts]="parts" [shapes]="shapes()" />`,
})
class Host {
  readonly parts = new FormArray<PartForm>([buildPartForm()]);
  readonly shapes = signal(shapes);
}

describe('PartsEditor', { timeout: 20_000 }, () => {
  let loader: HarnessLoader;
  let host: Host;
  let element: HTMLElement;

  beforeEach(async () => {
    const fixture = TestBed.createComponent(Host);
    host = fixture.componentInstance;
    element = fixture.nativeElement as HTMLElement;
    loader = TestbedHarnessEnvironment.loader(fixture);
    await fixture.whenStable();
  });

  const field = (label: string) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
  const input = async (label: string) => (await field(label)).getControl(MatInputHarness);
  const picker = (index: number) => loader.getHarness(MatSelectHarness.with({ selector: `li:nth-child(${index}) mat-select` }));

  it('groups the shapes as 2-D sections, 3-D bodies and whole objects, with a custom part last', async () => {
    const select = await picker(1);
    await select.open();
    const groups = await select.getOptionGroups();
    expect(await Promise.all(groups.map((group) => group.getLabelText()))).toEqual([
      '2-D sections (per span)',
      '3-D bodies',
      'Whole objects',
      'Known drag area',
    ]);
    expect(await Promise.all((await select.getOptions()).map((option) => option.getText()))).toEqual([
      'Circular cylinder in cross-flow',
      'Sphere',
      'Person standing',
      'Custom part with a known C_D·A',
    ]);
  });

  it('asks for the dimensions of the chosen shape, with units, and shows its area rule and source', async () => {
    await (await picker(1)).clickOptions({ text: 'Circular cylinder in cross-flow' });
    expect(await (await field('Diameter (m)')).getLabel()).toBe('Diameter (m)');
    expect(await (await field('Length (m)')).getLabel()).toBe('Length (m)');
    expect(element.textContent).toContain('Reference area: length × diameter');
    expect(element.textContent).toContain('Source: Invented handbook of drag, table 1');
    expect(host.parts.at(0).valid).toBe(false);

    await (await input('Diameter (m)'))?.setValue('0.05');
    await (await input('Length (m)'))?.setValue('1.2');
    expect(host.parts.at(0).valid).toBe(true);
    expect(host.parts.at(0).getRawValue()).toMatchObject({ type: 'shape', shapeId: 'circular-cylinder-cross-flow', diameter: 0.05, length: 1.2, count: 1 });
  });

  it('explains a zero dimension and a fractional count', async () => {
    await (await picker(1)).clickOptions({ text: 'Sphere' });
    await (await input('Diameter (m)'))?.setValue('0');
    await (await input('Count'))?.setValue('1.5');
    await (await input('Diameter (m)'))?.blur();
    await (await input('Count'))?.blur();
    expect(await (await field('Diameter (m)')).getTextErrors()).toEqual(['Diameter must be greater than zero']);
    expect(await (await field('Count')).getTextErrors()).toEqual(['Count must be a whole number']);
  });

  it('takes a custom part by name and known C_D·A', async () => {
    await (await picker(1)).clickOptions({ text: 'Custom part with a known C_D·A' });
    await (await input('Part name'))?.setValue('Mounting box');
    expect(host.parts.at(0).valid).toBe(false);
    await (await input('Drag area C_D·A per item (m²)'))?.setValue('0.05');
    expect(host.parts.at(0).valid).toBe(true);
    expect(host.parts.at(0).getRawValue()).toMatchObject({ type: 'custom', label: 'Mounting box', dragArea: 0.05 });
  });

  it('lets an object use its typical frontal area', async () => {
    await (await picker(1)).clickOptions({ text: 'Person standing' });
    expect(host.parts.at(0).valid).toBe(true);
    expect(element.textContent).toContain('typical frontal area 0.55 m²');
  });

  it('adds and removes rows, never removing the last one', async () => {
    const remove = (n: number) => loader.getHarness(MatButtonHarness.with({ selector: `[aria-label="Remove part ${n}"]` }));
    expect(await (await remove(1)).isDisabled()).toBe(true);
    await (await loader.getHarness(MatButtonHarness.with({ text: /Add part/ }))).click();
    await (await loader.getHarness(MatButtonHarness.with({ text: /Add part/ }))).click();
    expect(host.parts.length).toBe(3);
    await (await picker(2)).clickOptions({ text: 'Sphere' });
    await (await remove(1)).click();
    expect(host.parts.length).toBe(2);
    expect(host.parts.at(0).controls.shapeId.value).toBe('sphere');
  });
});
