import crypto from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import type { PhotoType } from '@shared/photos/schemas';

/**
 * Photo bytes on disk (diagnosis photos and procedure pictures alike):
 * <DATA_DIR>/photos/<shopId>/<32 random hex>.<ext>. The name the file had on
 * the device is never used, so no upload can pick its path.
 */
const EXTENSION: Record<PhotoType, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };
const SHOP_ID = /^[0-9a-f-]{36}$/;
const STORAGE_KEY = /^[0-9a-f]{32}\.(jpg|png|webp)$/;

/** The file of a stored photo; throws when the shop id or key is not one this module made. */
export function photoFile(dataDir: string, shopId: string, storageKey: string): string {
  if (!SHOP_ID.test(shopId) || !STORAGE_KEY.test(storageKey)) throw new Error(`not a photo storage key: ${shopId}/${storageKey}`);
  return path.join(dataDir, 'photos', shopId, storageKey);
}

/** Writes the bytes under a new random name and flushes them to disk before the row that names them is committed. */
export async function storePhoto(dataDir: string, shopId: string, bytes: Buffer, contentType: PhotoType): Promise<string> {
  const storageKey = `${crypto.randomBytes(16).toString('hex')}.${EXTENSION[contentType]}`;
  const file = photoFile(dataDir, shopId, storageKey);
  await fs.mkdir(path.dirname(file), { recursive: true, mode: 0o700 });
  const handle = await fs.open(file, 'wx', 0o600);
  try {
    await handle.writeFile(bytes);
    await handle.sync();
  } finally {
    await handle.close();
  }
  return storageKey;
}

export async function removePhoto(dataDir: string, shopId: string, storageKey: string): Promise<void> {
  await fs.rm(photoFile(dataDir, shopId, storageKey), { force: true });
}

export function extensionOf(contentType: string): string {
  return EXTENSION[contentType as PhotoType] ?? 'bin';
}
