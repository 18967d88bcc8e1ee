import request from 'supertest';
import { startTestApp, TestApp } from './setup/test-app';

describe('GET /api/health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('reports the app and the database as up', async () => {
    const res = await request(t.app.getHttpServer()).get('/api/health').expect(200);
    expect(res.body).toMatchObject({
      status: 'ok',
      app: { name: 'evenset' },
      database: { status: 'up' },
    });
  });

  it('publishes the OpenAPI description', async () => {
    const res = await request(t.app.getHttpServer()).get('/api/docs-json').expect(200);
    expect(Object.keys(res.body.paths)).toEqual(
      expect.arrayContaining(['/api/auth/login', '/api/users', '/api/health']),
    );
  });

  it('answers unknown API paths with the error shape, not a page', async () => {
    const res = await request(t.app.getHttpServer()).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toMatchObject({ code: 'NOT_FOUND', message: 'There is nothing at this address.' });
  });
});
