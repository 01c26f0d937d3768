import type { SessionUser } from '../../../shared/schemas/auth';
import { HttpError, notFound } from '../../lib/errors';
import { ALLOWED_DESCRIPTION, sniffUpload } from '../../lib/file-sniff';
import type { QuoteDeps } from './deps';
import * as repo from './repository';
import { loadVisible } from './service';
import { cleanFilename } from './upload';

/** Keeps a datasheet or drawing with the quote: type checked by content, stored under a random name. */
export async function addAttachment(
  deps: QuoteDeps,
  user: SessionUser,
  quoteId: string,
  file: { originalname: string; buffer: Buffer } | undefined,
) {
  await loadVisible(deps, user, quoteId);
  if (!file) throw new HttpError(400, 'invalid-input', 'Choose a file to attach (form field "file").', { file: 'required' });
  const filename = cleanFilename(file.originalname);
  const contentType = await sniffUpload(file.buffer, filename);
  if (!contentType) {
    throw new HttpError(415, 'unsupported-file', `${filename} is not a ${ALLOWED_DESCRIPTION} file (checked by its content and its name).`, {
      file: `must be ${ALLOWED_DESCRIPTION}`,
    });
  }
  const { key, sha256 } = await deps.storage.put(file.buffer);
  const id = await repo.insertAttachment(deps.db, { quoteId, uploadedBy: user.id, filename, contentType, size: file.buffer.length, sha256, storageKey: key });
  await repo.insertEvent(deps.db, { quoteId, actorId: user.id, kind: 'attachment', message: `Attached ${filename}` });
  return { id, filename, contentType, size: file.buffer.length, sha256, uploadedBy: user.name, createdAt: new Date().toISOString() };
}

export async function readAttachment(deps: QuoteDeps, user: SessionUser, quoteId: string, attachmentId: string) {
  await loadVisible(deps, user, quoteId);
  const found = (await repo.listAttachments(deps.db, quoteId)).find((a) => a.id === attachmentId);
  if (!found) throw notFound('No such attachment on this quote.');
  // cleaned again: names stored before the upload cleaned them may hold characters no header allows
  return { ...found, filename: cleanFilename(found.filename), content: await deps.storage.get(found.storageKey) };
}
