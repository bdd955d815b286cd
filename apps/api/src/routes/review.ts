import { fullScaleInputSchema, testReviewQuerySchema } from '@tunnelwright/contracts';
import { fullScaleEstimate } from '../review/full-scale-estimate';
import { loadTestReview } from '../review/test-review';
import { sampleEngineReductionId, sampleReviewTestId } from './review-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

/** /api/review: the analyst's view of a test's reduced data, and full-scale estimates from one reduction (staff only). */
export const reviewRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/tests/:id',
    access: staff,
    summary:
      'Every run with its finished versions and the chosen one (`reductionIds`, comma-separated; default the newest) in full: points with C_D, C_L, C_Y and U (k = 2), warnings, exclusions; sphere calibration runs with reference curves and turbulence factor',
    query: testReviewQuerySchema,
    sample: { params: async (f) => ({ id: await sampleReviewTestId(f) }), expect: 200 },
    handler: async ({ params, query, res }) => {
      res.json(await loadTestReview(params.id ?? '', query.reductionIds));
    },
  }),
  route({
    method: 'post',
    path: '/reductions/:id/full-scale',
    access: staff,
    summary:
      'Wind-averaged C_D, full-scale drag and power at a ground speed and wind (m/s, direction in degrees, 0 = head wind), power against wind direction, and the model-to-full-scale Reynolds-number ratio',
    body: fullScaleInputSchema,
    sample: { params: async (f) => ({ id: await sampleEngineReductionId(f) }), body: () => ({ groundSpeed: 25, windSpeed: 3, windDirection: 0 }), expect: 200 },
    handler: async ({ params, body, res }) => {
      res.json(await fullScaleEstimate(params.id ?? '', body));
    },
  }),
];
