import { IsNull } from 'typeorm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PasswordReset } from '@server/auth/password-reset.entity';
import { DEMO_PASSWORD } from '@server/seed/demo-accounts';
import { createHarness, demoEmail, linkToken, type Harness } from '../support/api-harness';

let h: Harness;
let owner: string;
beforeAll(async () => {
  h = await createHarness();
  owner = await h.tokenFor('owner');
});
afterAll(() => h.close());

describe('invite through the mail fake', () => {
  it('mails a link that lets the person set a password, join with the invited role and sign in', async () => {
    const created = await request(h.app).post('/api/invites').set('authorization', `Bearer ${owner}`).send({ email: 'Priya@HarrowLane.example', role: 'tech' });
    expect(created.status).toBe(201);
    expect(created.body.mailSent).toBe(true);

    const [mail] = await h.mailTo('priya@harrowlane.example');
    expect(mail.subject).toContain('Harrow Lane Motor Works');
    expect(mail.text).toContain('http://probepath.test/invite?token=');
    const token = linkToken(mail, 'invite');

    const preview = await request(h.app).get('/api/invites/preview').query({ token });
    expect(preview.body).toEqual({ email: 'priya@harrowlane.example', role: 'tech', shopName: 'Harrow Lane Motor Works' });

    const accepted = await request(h.app).post('/api/invites/accept').send({ token, name: 'Priya Nandakumar', password: 'priya-bench-pass' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ role: 'tech', name: 'Priya Nandakumar', shopName: 'Harrow Lane Motor Works' });

    const signIn = await request(h.app).post('/api/auth/sign-in').send({ email: 'priya@harrowlane.example', password: 'priya-bench-pass' });
    expect(signIn.status).toBe(200);
    expect(signIn.body.user.role).toBe('tech');

    const again = await request(h.app).post('/api/invites/accept').send({ token, name: 'Someone Else', password: 'another-password' });
    expect(again.status).toBe(410);
    expect((await request(h.app).get('/api/invites/preview').query({ token })).status).toBe(410);
  });

  it('stops a revoked invite link from working and lists only pending invites', async () => {
    const created = await request(h.app).post('/api/invites').set('authorization', `Bearer ${owner}`).send({ email: 'sam@harrowlane.example', role: 'apprentice' });
    const token = linkToken((await h.mailTo('sam@harrowlane.example'))[0], 'invite');
    const listed = await request(h.app).get('/api/invites').set('authorization', `Bearer ${owner}`);
    expect(listed.body.invites.map((i: { email: string }) => i.email)).toContain('sam@harrowlane.example');

    expect((await request(h.app).delete(`/api/invites/${created.body.invite.id}`).set('authorization', `Bearer ${owner}`)).status).toBe(204);
    const accept = await request(h.app).post('/api/invites/accept').send({ token, name: 'Sam', password: 'sam-password-1' });
    expect(accept.status).toBe(410);
    const after = await request(h.app).get('/api/invites').set('authorization', `Bearer ${owner}`);
    expect(after.body.invites.map((i: { email: string }) => i.email)).not.toContain('sam@harrowlane.example');
  });

  it('refuses to invite an address that already has an account', async () => {
    const res = await request(h.app).post('/api/invites').set('authorization', `Bearer ${owner}`).send({ email: demoEmail('lead'), role: 'tech' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('already_member');
  });
});

describe('password reset through the mail fake', () => {
  it('mails a single-use link that sets a new password; the old one stops working, and so do sessions signed in before', async () => {
    const email = demoEmail('apprentice');
    const before = (await request(h.app).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD })).body.token as string;
    expect((await request(h.app).get('/api/auth/me').set('authorization', `Bearer ${before}`)).status).toBe(200);
    expect((await request(h.app).post('/api/auth/forgot-password').send({ email })).status).toBe(202);
    const [mail] = await h.mailTo(email);
    expect(mail.subject).toBe('Reset your Probepath password');
    const token = linkToken(mail, 'reset-password');

    expect((await request(h.app).post('/api/auth/reset-password').send({ token, password: 'a-brand-new-password' })).status).toBe(204);
    expect((await request(h.app).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD })).status).toBe(401);
    const after = await request(h.app).post('/api/auth/sign-in').send({ email, password: 'a-brand-new-password' });
    expect(after.status).toBe(200);

    // Someone who knew the old password is signed out everywhere; the new session works.
    const stale = await request(h.app).get('/api/auth/me').set('authorization', `Bearer ${before}`);
    expect(stale.status).toBe(401);
    expect(stale.body.error.code).toBe('invalid_token');
    expect((await request(h.app).get('/api/auth/me').set('authorization', `Bearer ${after.body.token}`)).status).toBe(200);

    const reuse = await request(h.app).post('/api/auth/reset-password').send({ token, password: 'yet-another-password' });
    expect(reuse.status).toBe(400);
    expect(reuse.body.error.code).toBe('invalid_token');
  });

  it('refuses an expired reset link', async () => {
    const email = demoEmail('lead');
    await request(h.app).post('/api/auth/forgot-password').send({ email });
    const token = linkToken((await h.mailTo(email))[0], 'reset-password');
    await h.runtime.ctx.ds.getRepository(PasswordReset).update({ usedAt: IsNull() }, { expiresAt: new Date(Date.now() - 1000) });
    const res = await request(h.app).post('/api/auth/reset-password').send({ token, password: 'lead-new-password' });
    expect(res.status).toBe(400);
    expect((await request(h.app).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD })).status).toBe(200);
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    const res = await request(h.app).post('/api/auth/forgot-password').send({ email: 'ghost@harrowlane.example' });
    expect(res.status).toBe(202);
    expect(await h.mailTo('ghost@harrowlane.example')).toHaveLength(0);
  });
});

describe('when mail cannot be sent', () => {
  it('keeps the invite and says the e-mail did not go', async () => {
    await h.runtime.fakeSmtp!.close();
    const res = await request(h.app).post('/api/invites').set('authorization', `Bearer ${owner}`).send({ email: 'offline@harrowlane.example', role: 'tech' });
    expect(res.status).toBe(201);
    expect(res.body.mailSent).toBe(false);
    const listed = await request(h.app).get('/api/invites').set('authorization', `Bearer ${owner}`);
    expect(listed.body.invites.map((i: { email: string }) => i.email)).toContain('offline@harrowlane.example');
  });
});
