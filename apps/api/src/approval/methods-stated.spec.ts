import { describe, expect, it } from 'vitest';
import { methodsStated } from './sheet-data';

// ISO/IEC 17025:2017 §7.8.2.1 (e) asks the report to identify the method used; when configurations were reduced
// differently, each stated method has to say which results it applies to (common practice).
describe('methodsStated', () => {
  const maskell = { corrections: ['Solid blockage: Thom', 'Wake blockage: Maskell'], densityModel: 'CIPM-2007 moist-air density', codes: ['A', 'C'] };
  const none = { corrections: ['Solid blockage: none'], densityModel: 'Ideal-gas moist-air density', codes: ['B'] };

  it('states the method plainly when every configuration was reduced the same way', () => {
    expect(methodsStated([maskell])).toEqual({ correctionMethods: ['Solid blockage: Thom', 'Wake blockage: Maskell'], densityModel: 'CIPM-2007 moist-air density' });
  });

  it('names the configurations of each method when they differ', () => {
    expect(methodsStated([maskell, none])).toEqual({
      correctionMethods: ['Configurations A, C: Solid blockage: Thom', 'Configurations A, C: Wake blockage: Maskell', 'Configuration B: Solid blockage: none'],
      densityModel: 'Configurations A, C: CIPM-2007 moist-air density; Configuration B: Ideal-gas moist-air density',
    });
  });
});
