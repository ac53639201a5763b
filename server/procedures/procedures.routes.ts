import { In, IsNull, Not } from 'typeorm';
import { procedureFile, procedureFileName, readProcedureFile } from '@shared/procedures/exchange-format';
import type { ProcedureDocument } from '@shared/engine/procedure';
import type { DraftDetail, ProcedureDetail, ProcedureSummary, VersionDetail, VersionSummary } from '@shared/api/procedure-types';
import { copyTitle } from '@shared/procedures/copy-title';
import { copyDraftSchema, createProcedureSchema, newDraftSchema, publishDraftSchema, saveDraftSchema } from '@shared/procedures/schemas';
import type { CreateProcedureInput, PublishDraftInput } from '@shared/procedures/schemas';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { ApiError, notFound } from '../http/api-error';
import type { AuthedRequest, RouteDef } from '../http/route';
import { missingPictures, requireStoredPictures } from '../procedure-pictures/picture-references';
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
  note: v.note ?? null,
  updatedAt: v.updatedAt.toISOString(),
});

/** Per procedure, what the table shows beyond the procedure row: who touched it last and how often it ran. */
interface Activity {
  names: Map<string, string>;
  runs: Map<string, number>;
}

const summary = (p: Procedure, versions: ProcedureVersion[], activity: Activity): ProcedureSummary => {
  const published = versions.filter((v) => v.status === 'published').map((v) => v.number!);
  const numbered = versions.filter((v) => v.number !== null).sort((a, b) => b.number! - a.number!);
  const last = versions.reduce<ProcedureVersion | null>((latest, v) => (!latest || v.updatedAt > latest.updatedAt ? v : latest), null);
  return {
    id: p.id,
    title: p.title,
    complaint: p.complaint,
    family: p.family,
    latestPublished: published.length ? Math.max(...published) : null,
    hasDraft: versions.some((v) => v.status === 'draft'),
    latestVersion: numbered.length ? { number: numbered[0].number!, status: numbered[0].status === 'retired' ? 'retired' : 'published' } : null,
    createdAt: p.createdAt.toISOString(),
    lastEditedAt: (last && last.updatedAt > p.createdAt ? last.updatedAt : p.createdAt).toISOString(),
    lastEditedBy: activity.names.get(last?.updatedById ?? p.createdById) ?? null,
    timesRun: versions.reduce((n, v) => n + (activity.runs.get(v.id) ?? 0), 0),
  };
};

/** Names of who last edited each version and diagnosis counts per version, in two queries for the whole list. */
async function activityOf(ctx: Parameters<RouteDef['handler']>[2], shopId: string, versions: ProcedureVersion[], procedures: Procedure[]): Promise<Activity> {
  const ids = [...new Set([...versions.map((v) => v.updatedById), ...procedures.map((p) => p.createdById)])];
  const users = ids.length ? await ctx.ds.getRepository(User).find({ where: { id: In(ids), shopId }, select: { id: true, name: true } }) : [];
  const counts: { versionId: string; n: number }[] = await ctx.ds
    .getRepository(Diagnosis)
    .createQueryBuilder('d')
    .select('d.versionId', 'versionId')
    .addSelect('COUNT(*)', 'n')
    .where('d.shopId = :shopId', { shopId })
    .groupBy('d.versionId')
    .getRawMany();
  return { names: new Map(users.map((u) => [u.id, u.name])), runs: new Map(counts.map((c) => [c.versionId, Number(c.n)])) };
}

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

/** A new procedure whose first draft holds `document`, in one transaction: all of it is stored or none. */
async function createWithDraft(ctx: Parameters<RouteDef['handler']>[2], req: AuthedRequest, meta: CreateProcedureInput, document: ProcedureDocument) {
  return ctx.write(async (tx) => {
    const procedure = await tx.getRepository(Procedure).save({ ...meta, shopId: req.member.shopId, createdById: req.member.id });
    const draft = await tx.getRepository(ProcedureVersion).save({
      shopId: req.member.shopId,
      procedureId: procedure.id,
      status: 'draft',
      number: null,
      revision: 1,
      document,
      updatedById: req.member.id,
      publishedAt: null,
      publishedById: null,
      note: null,
      retiredAt: null,
    });
    return { procedure, draft };
  });
}

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
        select: { id: true, procedureId: true, status: true, number: true, updatedAt: true, updatedById: true },
      });
      const byProcedure = new Map<string, ProcedureVersion[]>();
      for (const v of versions) byProcedure.set(v.procedureId, [...(byProcedure.get(v.procedureId) ?? []), v]);
      const activity = await activityOf(ctx, req.member.shopId, versions, procedures);
      const list = procedures.map((p) => summary(p, byProcedure.get(p.id) ?? [], activity));
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
      const { procedure, draft } = await createWithDraft(ctx, req, req.body as CreateProcedureInput, starterDocument());
      res.status(201).json({ procedure: summary(procedure, [draft], await activityOf(ctx, req.member.shopId, [draft], [procedure])) });
    },
  },
  {
    method: 'post',
    path: '/api/procedures/import',
    summary: 'Import a procedure file (format probepath.procedure, version 1) as a new procedure with a draft; refused whole, with every error, when anything is wrong.',
    roles: AUTHORS,
    async handler(req, res, ctx) {
      const read = readProcedureFile(req.body);
      const file = read.ok ? await withStoredPictures(ctx, req.member.shopId, read) : read;
      if (!file.ok) {
        const shown = file.errors.slice(0, 5).join(' ');
        const more = file.errors.length > 5 ? ` (and ${file.errors.length - 5} more)` : '';
        throw new ApiError(400, 'invalid_procedure_file', `Nothing was imported. ${shown}${more}`, undefined, { errors: file.errors.slice(0, 100) });
      }
      const { procedure, draft } = await createWithDraft(ctx, req, { title: file.title, complaint: file.complaint, family: file.family }, file.document);
      res.status(201).json({ procedure: summary(procedure, [draft], await activityOf(ctx, req.member.shopId, [draft], [procedure])) });
    },
  },
  {
    method: 'post',
    path: '/api/procedures/:id/copy',
    summary:
      'A new procedure, titled "… (copy)" (numbered when that title is taken), whose draft is the document sent (an editor keeping its changes after a conflicting save) or, without one, a copy of the draft, else of the latest version (Duplicate).',
    roles: AUTHORS,
    body: copyDraftSchema,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const sent = (req.body as { document?: unknown }).document;
      const document = sent === undefined ? await latestDocument(ctx, p.id) : readDocument(sent);
      await requireStoredPictures(ctx.ds.manager, req.member.shopId, document);
      const titles = await ctx.ds.getRepository(Procedure).find({ where: { shopId: req.member.shopId }, select: { title: true } });
      const meta = { title: copyTitle(p.title, titles.map((t) => t.title)), complaint: p.complaint, family: p.family };
      const { procedure, draft } = await createWithDraft(ctx, req, meta, document);
      res.status(201).json({ procedure: summary(procedure, [draft], await activityOf(ctx, req.member.shopId, [draft], [procedure])) });
    },
  },
  {
    method: 'get',
    path: '/api/procedures/:id/export',
    summary: 'The procedure as a probepath.procedure file: ?version=N, or the latest published version, or the draft when none is published.',
    roles: AUTHORS,
    async handler(req, res, ctx) {
      const p = await findProcedure(req, ctx);
      const repo = ctx.ds.getRepository(ProcedureVersion);
      const v = req.query.version !== undefined
        ? await repo.findOneBy({ procedureId: p.id, number: versionNumber(req.query.version) })
        : ((await repo.findOne({ where: { procedureId: p.id, status: 'published' }, order: { number: 'DESC' } })) ?? (await repo.findOneBy({ procedureId: p.id, status: 'draft' })));
      if (!v) throw notFound('version');
      const exportedFrom = v.number === null ? 'draft' : String(v.number);
      res.setHeader('Content-Disposition', `attachment; filename="${procedureFileName(p.title, exportedFrom)}"`);
      res.json(procedureFile(p, exportedFrom, v.document));
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
      const detail: ProcedureDetail = { ...summary(p, versions, await activityOf(ctx, req.member.shopId, versions, [p])), versions: visible.map((v) => versionSummary(v, names)) };
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
          note: null,
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
      await requireStoredPictures(ctx.ds.manager, req.member.shopId, document);
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
      const { revision, note } = req.body as PublishDraftInput;
      const number = await ctx.write(async (tx) => {
        const repo = tx.getRepository(ProcedureVersion);
        const draft = await repo.findOneBy({ procedureId: p.id, status: 'draft' });
        if (!draft) throw new ApiError(404, 'no_draft', 'This procedure has no draft to publish.');
        if (draft.revision !== revision) throw staleDraft(draft.revision);
        await requireStoredPictures(tx, p.shopId, draft.document);
        const problems = problemsOf(draft.document);
        if (problems.length) {
          throw new ApiError(422, 'invalid_procedure', `The draft has ${problems.length} problem${problems.length > 1 ? 's' : ''} to fix before it can be published.`, undefined, { problems });
        }
        const last = await repo.findOne({ where: { procedureId: p.id, number: Not(IsNull()) }, order: { number: 'DESC' } });
        const next = (last?.number ?? 0) + 1;
        await repo.update({ id: draft.id }, { status: 'published', number: next, publishedAt: new Date(), publishedById: req.member.id, note: note || null });
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

/** What Duplicate copies: the draft being written, else the highest-numbered version (published or retired). */
async function latestDocument(ctx: Parameters<RouteDef['handler']>[2], procedureId: string): Promise<ProcedureDocument> {
  const repo = ctx.ds.getRepository(ProcedureVersion);
  const v = (await repo.findOneBy({ procedureId, status: 'draft' })) ?? (await repo.findOne({ where: { procedureId, number: Not(IsNull()) }, order: { number: 'DESC' } }));
  if (!v) throw notFound('version');
  return v.document;
}

/** A file that reads well still needs its pictures in this shop: a procedure file names them but does not carry them. */
async function withStoredPictures(ctx: Parameters<RouteDef['handler']>[2], shopId: string, file: Extract<ReturnType<typeof readProcedureFile>, { ok: true }>) {
  const missing = await missingPictures(ctx.ds.manager, shopId, file.document);
  if (!missing.length) return file;
  return {
    ok: false as const,
    errors: [
      'A procedure file names its pictures but does not carry them: import it into the shop it came from, or remove the pictures from those checks in the file and upload them again after importing.',
      ...missing.map((m) => m.message),
    ],
  };
}

async function userNames(ctx: Parameters<RouteDef['handler']>[2], versions: ProcedureVersion[]) {
  const ids = [...new Set(versions.map((v) => v.publishedById).filter((x): x is string => !!x))];
  if (!ids.length) return new Map<string, string>();
  const users = await ctx.ds.getRepository(User).find({ where: { id: In(ids) }, select: { id: true, name: true } });
  return new Map(users.map((u) => [u.id, u.name]));
}
