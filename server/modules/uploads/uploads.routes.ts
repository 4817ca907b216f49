import { randomUUID } from 'node:crypto';
import { mkdir, readFile, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { Router } from 'express';
import { idParam } from '../../../shared/schemas/common';
import { uploadFields, uploadListQuery, type UploadDto, type UploadKind } from '../../../shared/schemas/uploads';
import type { UploadEntity } from '../../entities';
import { actorOf, requirePermission } from '../../auth/require';
import { badRequest, notFound } from '../../errors';
import { validate } from '../../middleware/validate';
import type { RouteContext } from '../module';
import { ACCEPTED, sniffUpload, svgProblems } from './upload-sniff';
import type { UploadsRepository } from './uploads.repository';
import { sendDownload } from '../../middleware/download';
import { uploadFile } from '../../middleware/upload';

export const presentUpload = (u: UploadEntity): UploadDto => ({
  id: u.id,
  kind: u.kind,
  styleId: u.styleId,
  originalName: u.originalName,
  mimeType: u.mimeType,
  size: u.size,
  uploadedBy: u.uploadedBy,
  createdAt: new Date(u.createdAt).toISOString(),
  url: `/api/uploads/${u.id}/file`,
});

/** data/uploads beside the database file (an in-memory database uses ./data/uploads). */
export function uploadsDir(databasePath: string | undefined): string {
  const db = databasePath && databasePath !== ':memory:' ? databasePath : 'data/seamrun.sqlite';
  return join(dirname(resolve(db)), 'uploads');
}

/** A display name only: no folders, no control characters, at most 200 characters. */
// eslint-disable-next-line no-control-regex
const safeName = (name: string) => basename(name.replace(/\\/g, '/')).replace(/[\x00-\x1F\x7F]/g, '').slice(0, 200) || 'file';

/** /api/uploads: sketches, photos, swatches, packing lists, measurement files (owner only). */
export function uploadsRoutes(repo: UploadsRepository, ctx: RouteContext) {
  const r = Router();
  const maxBytes = ctx.env.UPLOAD_MAX_BYTES ?? 5 * 1024 * 1024;
  const dir = uploadsDir(ctx.env.DATABASE_PATH);
  const receive = uploadFile({ maxBytes, maxFields: 10 });
  const owner = requirePermission('styles:write', 'suppliers:manage');

  r.post('/', owner, receive, validate({ body: uploadFields }), async (req, res) => {
    const actor = actorOf(req);
    const { kind, styleId } = req.body as { kind: UploadKind; styleId?: number };
    const file = req.file;
    if (!file || file.size === 0) throw badRequest('file: choose a file to upload', { file: 'Choose a file to upload' });
    if (styleId && !(await repo.styleExists(actor.studioId, styleId))) throw badRequest('styleId: no such style', { styleId: 'No such style' });
    const sniffed = await sniffUpload(file.buffer);
    const accepted = ACCEPTED[kind];
    if (!sniffed || !accepted.includes(sniffed.ext)) {
      throw badRequest(`file: a ${kind} must be ${accepted.join(', ')}; this file's content is ${sniffed?.ext ?? 'not a type we accept'}`, { file: `Accepted for ${kind}: ${accepted.join(', ')}` });
    }
    if (sniffed.ext === 'svg') {
      const problems = svgProblems(file.buffer.toString('utf8'));
      if (problems.length) throw badRequest(`file: this SVG carries ${problems.join(', ')}; export it again as a plain drawing`, { file: `SVG refused: ${problems.join(', ')}` });
    }
    const storedName = `${randomUUID()}.${sniffed.ext}`;
    await mkdir(dir, { recursive: true });
    await writeFile(join(dir, storedName), file.buffer, { flag: 'wx' });
    const u = await repo.insert({ studioId: actor.studioId, kind, styleId: styleId ?? null, originalName: safeName(file.originalname), mimeType: sniffed.mime, size: file.size, storedName, uploadedBy: actor.id });
    await ctx.audit.record(actor, 'create', 'upload', u.id, undefined, presentUpload(u));
    res.status(201).json({ upload: presentUpload(u) });
  });
  r.get('/', owner, validate({ query: uploadListQuery }), async (req, res) => {
    const q = req.query as { kind?: UploadKind; styleId?: number };
    res.json({ uploads: (await repo.list(actorOf(req).studioId, q)).map(presentUpload) });
  });
  r.get('/:id/file', owner, validate({ params: idParam }), async (req, res) => {
    const u = await repo.get(actorOf(req).studioId, Number(req.params.id));
    if (!u) throw notFound('Upload');
    const bytes = await readFile(join(dir, basename(u.storedName))).catch(() => null);
    if (!bytes) throw notFound('Upload file');
    sendDownload(res, { body: bytes, type: u.mimeType, filename: u.originalName, inline: u.mimeType.startsWith('image/'), untrusted: true });
  });
  r.delete('/:id', owner, validate({ params: idParam }), async (req, res) => {
    const actor = actorOf(req);
    const u = await repo.get(actor.studioId, Number(req.params.id));
    if (!u) throw notFound('Upload');
    await repo.remove(actor.studioId, u.id);
    await unlink(join(dir, basename(u.storedName))).catch(() => undefined);
    await ctx.audit.record(actor, 'delete', 'upload', u.id, presentUpload(u), undefined);
    res.status(204).end();
  });
  return r;
}
