import { createReadStream } from 'node:fs';
import fs from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import type { Response } from 'express';
import { ApiError } from '../http/api-error';
import { extensionOf, photoFile } from './photo-storage';

/** What is needed to answer with a stored picture's bytes. */
export interface StoredPicture {
  id: string;
  shopId: string;
  storageKey: string;
  contentType: string;
}

/** Answers with the bytes of a stored photo or picture, private to the shop, never sniffed by the browser. */
export async function sendPicture(res: Response, dataDir: string, picture: StoredPicture, namePrefix: string): Promise<void> {
  const file = photoFile(dataDir, picture.shopId, picture.storageKey);
  const stat = await fs.stat(file).catch(() => null);
  if (!stat) throw new ApiError(404, 'photo_missing', 'The picture is missing from the server’s data folder. Upload it again.');
  res.set({
    'Content-Type': picture.contentType,
    'Content-Length': String(stat.size),
    'Content-Disposition': `inline; filename="${namePrefix}-${picture.id}.${extensionOf(picture.contentType)}"`,
    'Cache-Control': 'private, max-age=86400',
    'X-Content-Type-Options': 'nosniff',
  });
  // A client that stops reading ends the stream; there is nobody left to answer.
  await pipeline(createReadStream(file), res).catch(() => res.destroy());
}
