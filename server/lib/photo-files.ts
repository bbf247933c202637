import { randomBytes } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { config } from '../config';
import { repoRoot } from './paths';

// Photo files: what a file really is (by its first bytes, never its name or declared type), where
// it is kept (UPLOAD_DIR/<groupId>/<random name>, outside the web root), and its thumbnail.

export type ImageType = 'image/jpeg' | 'image/png' | 'image/webp';

// Signatures: JPEG SOI marker FF D8 FF (ITU-T T.81 / JFIF); PNG's 8-byte signature (RFC 2083 §3.1,
// W3C PNG spec); WebP is a RIFF container whose form type is "WEBP" (RFC 9649 §2).
export function detectImageType(bytes: Buffer): ImageType | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  if (bytes.length >= 8 && bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'image/png';
  if (bytes.length >= 12 && bytes.toString('latin1', 0, 4) === 'RIFF' && bytes.toString('latin1', 8, 12) === 'WEBP') return 'image/webp';
  return null;
}

export const uploadRoot = () => path.resolve(repoRoot, config.UPLOAD_DIR);
const groupDir = (groupId: string) => path.join(uploadRoot(), groupId);
export const filePath = (groupId: string, name: string) => path.join(groupDir(groupId), path.basename(name));

/** 128 random bits: a name nobody can guess, and nothing in it about the photo or its group. */
export const randomName = () => randomBytes(16).toString('hex');

export async function writeFile(groupId: string, name: string, bytes: Buffer): Promise<void> {
  await fs.mkdir(groupDir(groupId), { recursive: true });
  // "wx": never overwrite, even in the unlikely event of a name already taken.
  await fs.writeFile(filePath(groupId, name), bytes, { flag: 'wx', mode: 0o600 });
}

export async function removeFiles(groupId: string, names: (string | null)[]): Promise<void> {
  await Promise.all(names.filter((n): n is string => !!n).map((n) => fs.rm(filePath(groupId, n), { force: true })));
}

const THUMB_EDGE = 480;
const THUMB_QUALITY = 78;
const THUMB_TIMEOUT_MS = 60_000;

type Pending = { resolve: (b: Buffer) => void; reject: (e: Error) => void; timer: NodeJS.Timeout };
let worker: Worker | null = null;
let nextId = 0;
const pending = new Map<number, Pending>();

// Starting a worker and loading jimp costs a second or two, so one worker lives on between photos;
// unref() lets the process exit without waiting for it. If it dies, every waiting photo fails and
// the next one starts a fresh worker.
function thumbnailWorker(): Worker {
  if (worker) return worker;
  const w = new Worker(new URL('./thumbnail-worker.mjs', import.meta.url));
  w.unref();
  w.on('message', ({ id, out, error }: { id: number; out?: Uint8Array; error?: string }) => {
    const job = pending.get(id);
    if (!job) return;
    pending.delete(id);
    clearTimeout(job.timer);
    if (out) job.resolve(Buffer.from(out));
    else job.reject(new Error(error ?? 'Thumbnail failed'));
  });
  const fail = (err: Error) => {
    if (worker === w) worker = null;
    for (const [id, job] of pending) {
      clearTimeout(job.timer);
      job.reject(err);
      pending.delete(id);
    }
  };
  w.on('error', fail);
  w.on('exit', (code) => fail(new Error(`Thumbnail worker stopped with code ${code}`)));
  worker = w;
  return w;
}

/** A JPEG at most 480 px on its longer side, made by jimp (pure JavaScript) in a worker thread. Rejects an undecodable image. */
export function makeThumbnail(bytes: Buffer): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const id = nextId++;
    // A picture that takes a minute is not one a phone took; stop the worker rather than wait on.
    const timer = setTimeout(() => void worker?.terminate(), THUMB_TIMEOUT_MS);
    pending.set(id, { resolve, reject, timer });
    thumbnailWorker().postMessage({ id, bytes, edge: THUMB_EDGE, quality: THUMB_QUALITY });
  });
}
