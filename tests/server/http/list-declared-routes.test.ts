import express, { Router } from 'express';
import { declareRoute } from '../../../server/http/declare-route';
import { listDeclaredRoutes } from '../../../server/http/list-declared-routes';
import { idParams } from '../../../shared/schemas/id-params';

describe('listDeclaredRoutes', () => {
  it('lists declared routes at their mounted paths and leaves out routes registered another way', () => {
    const app = express();
    const api = Router();
    const plans = Router();
    declareRoute(
      plans,
      'get',
      '/:id',
      { summary: 'one', access: 'public', params: idParams, responses: { 200: 'ok' } },
      () => undefined,
    );
    plans.post('/:id/undeclared', (_req, res) => void res.end());
    api.use('/plans', plans);
    declareRoute(
      api,
      'delete',
      '/',
      { summary: 'root', access: ['admin'], responses: { 204: 'gone' } },
      () => undefined,
    );
    app.use('/api', api);

    expect(listDeclaredRoutes(app).map(({ method, path, declaration }) => [method, path, declaration.summary])).toEqual(
      [
        ['get', '/api/plans/{id}', 'one'],
        ['delete', '/api', 'root'],
      ],
    );
  });
});
