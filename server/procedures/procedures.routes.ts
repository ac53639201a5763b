import { In, IsNull, Not } from 'typeorm';
import type { DraftDetail, ProcedureDetail, ProcedureSummary, VersionDetail, VersionSummary } from '@shared/api/procedure-types';
import { createProcedureSchema, newDraftSchema, publishDraftSchema, saveDraftSchema } from '@shared/procedures/schemas';
import type { CreateProcedureInput } from '@shared/procedures/schemas';
import { ApiError, notFound } from '../http/api-error';
import type { AuthedRequest, RouteDef } from '../http/route';
import { User } from '../users/user.entity';
import { ProcedureVersion } from './procedure-version.entity';
import { Procedure } from './procedure.entity';
import { problemsOf, readDocument, starterDocument } from './procedure-rules';

const AUTHORS = ['owner', 'lead'] as const;
const READERS = ['owner', 'lead', 'tech'] as const;

const versionSummary = (v: ProcedureVersion, names: Map<string, string>): VersionSummary => ({
  number: v.number,
  status: v.status,
  revision: v.revision,
  checkCount: v.document.checks.length,
  publishedAt: v.publishedAt?.toISOString() ?? null,
  publishedBy: v.publishedById ? (names.get(v.publishedById) ?? null) : null,
  updatedAt: v.updatedAt.toISOString(),
});

const summary = (p: Procedure, versions: ProcedureVersion[]): ProcedureSummary => {
  const published = versions.filter((v) => v.status === 'published').map((v) => v.number!);
  return {
    id: p.id,
    title: p.title,
    complaint: p.complaint,
    family: p.family,
    latestPublished: published.length ? Math.max(...published) : null,
    hasDraft: versions.some((v) => v.status === 'draft'),
    createdAt: p.createdAt.toISOString(),
  };
};

async function findProcedure(req: AuthedRequest, ctx: Parameters<RouteDef['handler']>[2]) {
  const p = await ctx.ds.getRepository(Procedure).findOneBy({ id: String(req.params.id), shopId: req.member.shopId });
  if (!p) throw notFound('procedure');
  return p;
}

const versionNumber = (raw: unknown) => {
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) throw new ApiError(400, 'invalid_input', 'A version number is a whole number from 1.');
  return n;
};

const staleDraft = (current: number) =>
  new ApiError(409, 'stale_revision', `Someone saved this draft since you opened it (it is now revision ${current}). Reload it, then make your change again.`);

export const procedureRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/procedures',
    summary: "The shop's procedures; technicians see only those with a published version.",
    roles: READERS,
    async handler(req, res, ctx) {
      const procedures = await ctx.ds.getRepository(Procedure).find({ where: { shopId: req.member.shopId }, order: { title: 'ASC' } });
      const versions = await ctx.ds.getRepository(ProcedureVersion).find({
        where: { shopId: req.member.shopId },
        select: { id: true, procedureId: true, status: true, number: true },
      });
      const byProcedure = new Map<string, ProcedureVersion[]>();
      for (const v of versions) byProcedure.set(v.procedureId, [...(byProcedure.get(v.procedureId) ?? []), v]);
      const list = procedures.map((p) => summary(p, byProcedure.get(p.id) ?? []));
      res.json({ procedures: req.member.role === 'tech' ? list.filter((p) => p.latestPublished !== null) : list });
    },
  },
  {
    method: 'post',
    path: '/api/procedures',
    summary: 'Create a procedure with a first draft holding one finding to start from.',
    roles: AUTHORS,
    body: createProcedureSchema,
    async handler(req, res, ctx) {
      const input = req.body as CreateProcedureInput;
      const { procedure, draft } = await ctx.write(async (tx) => {
        const procedure = await tx.getRepository(Procedure).save({ ...input, shopId: req.member.shopId, createdById: req.member.id });
        const draft = await tx.getRepository(ProcedureVersion).save({
          shopId: req.member.shopId,
          procedureId: procedure.id,
          status: 'draft',
          number: null,
          revision: 1,
          document: starterDocument(),
          updatedById: req.member.id,
          publishedAt: null,
          publishedById: null,
          retiredAt: null,
        });
        return { procedure, draft };
      });
      res.status(201).json({ procedure: summary(procedure, [draft]) });
    },
  },
  {
    method: 'get',
    path: '/api/procedures/:id',
    summary: 'A procedure with its versions.',
    roles: READERS,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const versions = await ctx.ds.getRepository(ProcedureVersion).find({ where: { procedureId: p.id }, order: { number: 'DESC' } });
      const names = await userNames(ctx, versions);
      const visible = req.member.role === 'tech' ? versions.filter((v) => v.status !== 'draft') : versions;
      if (req.member.role === 'tech' && !visible.some((v) => v.status === 'published')) throw notFound('procedure');
      const detail: ProcedureDetail = { ...summary(p, versions), versions: visible.map((v) => versionSummary(v, names)) };
      res.json({ procedure: detail });
    },
  },
  {
    method: 'get',
    path: '/api/procedures/:id/versions/:number',
    summary: 'One published or retired version with its document.',
    roles: READERS,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const v = await ctx.ds.getRepository(ProcedureVersion).findOneBy({ procedureId: p.id, number: versionNumber(req.params.number) });
      if (!v) throw notFound('version');
      const detail: VersionDetail = { ...versionSummary(v, await userNames(ctx, [v])), procedureId: p.id, document: v.document };
      res.json({ version: detail });
    },
  },
  {
    method: 'put',
    path: '/api/procedures/:id/versions/:number',
    summary: 'Always refused: a published or retired version never changes. Start a new draft instead.',
    roles: AUTHORS,
    async handler(req, _res, ctx) {
      const p = await findProcedure(req, ctx);
      const v = await ctx.ds.getRepository(ProcedureVersion).findOneBy({ procedureId: p.id, number: versionNumber(req.params.number) });
      if (!v) throw notFound('version');
      throw new ApiError(409, 'version_immutable', `Version ${v.number} is ${v.status} and cannot change. Start a new draft from it and publish that.`);
    },
  },
  {
    method: 'get',
    path: '/api/procedures/:id/draft',
    summary: 'The draft with its revision and its validation problems.',
    roles: AUTHORS,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const v = await ctx.ds.getRepository(ProcedureVersion).findOneBy({ procedureId: p.id, status: 'draft' });
      if (!v) throw new ApiError(404, 'no_draft', 'This procedure has no draft. Start one from a published version.');
      const detail: DraftDetail = { ...versionSummary(v, new Map()), procedureId: p.id, document: v.document, problems: problemsOf(v.document) };
      res.json({ draft: detail });
    },
  },
  {
    method: 'post',
    path: '/api/procedures/:id/draft',
    summary: 'Start a new draft as a copy of a published or retired version.',
    roles: AUTHORS,
    body: newDraftSchema,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const { fromVersion } = req.body as { fromVersion: number };
      const draft = await ctx.write(async (tx) => {
        const repo = tx.getRepository(ProcedureVersion);
        if (await repo.existsBy({ procedureId: p.id, status: 'draft' })) {
          throw new ApiError(409, 'draft_exists', 'This procedure already has a draft. Open it instead.');
        }
        const source = await repo.findOneBy({ procedureId: p.id, number: fromVersion });
        if (!source) throw notFound('version');
        return repo.save({
          shopId: p.shopId,
          procedureId: p.id,
          status: 'draft',
          number: null,
          revision: 1,
          document: source.document,
          updatedById: req.member.id,
          publishedAt: null,
          publishedById: null,
          retiredAt: null,
        });
      });
      res.status(201).json({ draft: { ...versionSummary(draft, new Map()), procedureId: p.id, document: draft.document, problems: problemsOf(draft.document) } });
    },
  },
  {
    method: 'put',
    path: '/api/procedures/:id/draft',
    summary: 'Save the draft. Send the revision you edited; a stale revision answers 409 and overwrites nothing.',
    roles: AUTHORS,
    body: saveDraftSchema,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const { revision } = req.body as { revision: number };
      const document = readDocument((req.body as { document: unknown }).document);
      const saved = await ctx.write(async (tx) => {
        const repo = tx.getRepository(ProcedureVersion);
        const draft = await repo.findOneBy({ procedureId: p.id, status: 'draft' });
        if (!draft) throw new ApiError(404, 'no_draft', 'This procedure has no draft. Start one from a published version.');
        const result = await repo.update({ id: draft.id, status: 'draft', revision }, { document, revision: revision + 1, updatedById: req.member.id });
        if (!result.affected) throw staleDraft(draft.revision);
        return { revision: revision + 1 };
      });
      res.json({ revision: saved.revision, problems: problemsOf(document) });
    },
  },
  {
    method: 'post',
    path: '/api/procedures/:id/draft/validate',
    summary: 'Validate the saved draft: every problem names its check and says what to fix.',
    roles: AUTHORS,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const v = await ctx.ds.getRepository(ProcedureVersion).findOneBy({ procedureId: p.id, status: 'draft' });
      if (!v) throw new ApiError(404, 'no_draft', 'This procedure has no draft.');
      res.json({ revision: v.revision, problems: problemsOf(v.document) });
    },
  },
  {
    method: 'post',
    path: '/api/procedures/:id/draft/publish',
    summary: 'Publish the draft as the next version number; refused with the problem list while it is invalid.',
    roles: AUTHORS,
    body: publishDraftSchema,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const { revision } = req.body as { revision: number };
      const number = await ctx.write(async (tx) => {
        const repo = tx.getRepository(ProcedureVersion);
        const draft = await repo.findOneBy({ procedureId: p.id, status: 'draft' });
        if (!draft) throw new ApiError(404, 'no_draft', 'This procedure has no draft to publish.');
        if (draft.revision !== revision) throw staleDraft(draft.revision);
        const problems = problemsOf(draft.document);
        if (problems.length) {
          throw new ApiError(422, 'invalid_procedure', `The draft has ${problems.length} problem${problems.length > 1 ? 's' : ''} to fix before it can be published.`, undefined, { problems });
        }
        const last = await repo.findOne({ where: { procedureId: p.id, number: Not(IsNull()) }, order: { number: 'DESC' } });
        const next = (last?.number ?? 0) + 1;
        await repo.update({ id: draft.id }, { status: 'published', number: next, publishedAt: new Date(), publishedById: req.member.id });
        return next;
      });
      res.json({ version: number });
    },
  },
  {
    method: 'post',
    path: '/api/procedures/:id/versions/:number/retire',
    summary: 'Retire a published version: it stays readable but no new diagnosis can start on it.',
    roles: AUTHORS,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const number = versionNumber(req.params.number);
      await ctx.write(async (tx) => {
        const result = await tx.getRepository(ProcedureVersion).update({ procedureId: p.id, number, status: 'published' }, { status: 'retired', retiredAt: new Date() });
        if (!result.affected) throw new ApiError(404, 'not_found', `Version ${number} is not a published version of this procedure.`);
      });
      res.json({ version: number, status: 'retired' });
    },
  },
];

async function userNames(ctx: Parameters<RouteDef['handler']>[2], versions: ProcedureVersion[]) {
  const ids = [...new Set(versions.map((v) => v.publishedById).filter((x): x is string => !!x))];
  if (!ids.length) return new Map<string, string>();
  const users = await ctx.ds.getRepository(User).find({ where: { id: In(ids) }, select: { id: true, name: true } });
  return new Map(users.map((u) => [u.id, u.name]));
}
