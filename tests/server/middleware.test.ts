import express from 'express';
import request from 'supertest';
import { z } from 'zod';
import type { User } from '@/shared/api/auth';
import { requireCapability, requireRole, requireUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { errorHandler } from '@/server/middleware/errors';
import { createPasswords } from '@/server/services/passwords';
import bcrypt from 'bcryptjs';

/** A tiny app whose "session" is a header, to test the guards alone. */
function guarded(...guards: express.RequestHandler[]) {
  const app = express();
  app.use((req, _res, next) => {
    const role = req.get('x-test-role');
    if (role) req.user = { id: 1, email: 'x@tidewater.example', name: 'X', role: role as User['role'], teamId: 1 };
    next();
  });
  app.get('/thing', ...guards, (_req, res) => {
    res.json({ ok: true });
  });
  return app;
}

describe('role guards', () => {
  it('requireUser: 401 without a user, through with one', async () => {
    const app = guarded(requireUser);
    await request(app).get('/thing').expect(401);
    await request(app).get('/thing').set('x-test-role', 'installer').expect(200);
  });

  it('requireRole: 401 signed out, 403 for other roles, through for the listed ones', async () => {
    const app = guarded(requireRole('admin', 'reviewer'));
    await request(app).get('/thing').expect(401);
    await request(app).get('/thing').set('x-test-role', 'designer').expect(403);
    await request(app).get('/thing').set('x-test-role', 'reviewer').expect(200);
    await request(app).get('/thing').set('x-test-role', 'admin').expect(200);
  });

  it('requireCapability follows the shared role table (docs/api.md: only admins and designers edit designs)', async () => {
    const app = guarded(requireCapability('editDesigns'));
    const statuses = [];
    for (const role of ['admin', 'designer', 'reviewer', 'installer']) {
      statuses.push((await request(app).get('/thing').set('x-test-role', role)).status);
    }
    expect(statuses).toEqual([200, 200, 403, 403]);
  });
});

describe('validate()', () => {
  const check = validate({
    body: z.object({ name: z.string().min(1), size: z.number().int() }).strict(),
    params: z.object({ id: z.coerce.number().int().positive() }),
    query: z.object({ against: z.coerce.number().int().optional() }),
  });
  const app = express();
  app.use(express.json());
  app.post('/things/:id', check, (req, res) => {
    res.json(check.input(req));
  });
  app.use(errorHandler);

  it('hands the handler the parsed, coerced values', async () => {
    const res = await request(app).post('/things/12?against=3').send({ name: 'fab-a', size: 4 }).expect(200);
    expect(res.body).toEqual({ body: { name: 'fab-a', size: 4 }, params: { id: 12 }, query: { against: 3 } });
  });

  it('lists all problems of body, params and query in one 400', async () => {
    const res = await request(app).post('/things/zero?against=x').send({ name: '', size: 1.5 });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['name', 'params.id', 'query.against', 'size']);
    expect(res.body.error).toBe('The request has 4 problems; see issues.');
  });

  it('names the one problem in the error sentence', async () => {
    const res = await request(app).post('/things/1').send({ name: 'x', size: 'big' });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/^size: /);
  });
});

describe('password hashing', () => {
  it('hashes with the configured bcrypt cost and verifies', async () => {
    const passwords = createPasswords(5);
    const hash = await passwords.hash('cold-aisle-42-spare');
    expect(bcrypt.getRounds(hash)).toBe(5);
    expect(await passwords.verify('cold-aisle-42-spare', hash)).toBe(true);
    expect(await passwords.verify('cold-aisle-42-sparE', hash)).toBe(false);
  });

  it('still runs a bcrypt comparison when there is no account, so timing does not tell', async () => {
    const passwords = createPasswords(4);
    const spy = jest.spyOn(bcrypt, 'compare');
    try {
      expect(await passwords.verify('whatever', null)).toBe(false);
      expect(spy).toHaveBeenCalledTimes(1);
    } finally {
      spy.mockRestore();
    }
  });
});
