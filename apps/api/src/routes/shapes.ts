import { shapeList } from '../planner/plan-presenters';
import { route, type RouteDef } from './route';

/** /api/shapes: the planner's shape library with sources, dimensions and reference-area rules. */
export const shapeRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: ['customer', 'analyst', 'lab_manager'],
    summary: 'The planner shape library: C_D, reference-area rule, dimensions, Reynolds range and source of every entry',
    sample: { expect: 200 },
    handler: async ({ res }) => {
      res.json(shapeList());
    },
  }),
];
