import { createWriteStream } from 'node:fs';
import { rm } from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import busboy from 'busboy';
import type { Request } from 'express';
import { BadRequestError, HttpError } from '../../http/errors';
import { uploadTempPath } from './upload-temp';

export interface ReceivedUpload {
  /** Temporary file holding the bytes; call `discard()` when done with it. */
  path: string;
  size: number;
  fields: Record<string, string>;
  /** The content type the client declared for the file (never trusted alone: content is sniffed). */
  mimeType: string;
  discard(): Promise<void>;
}

/**
 * Streams a multipart upload (one file in field `file`) to a temporary file, so memory stays flat
 * whatever the size; refuses files over `maxBytes` with 413 and leaves nothing behind.
 */
export function receiveUpload(req: Request, maxBytes: number): Promise<ReceivedUpload> {
  if (!req.is('multipart/form-data'))
    return Promise.reject(
      new BadRequestError('Send the photo as multipart/form-data with the image in the field "file".'),
    );
  const temp = uploadTempPath();
  const tmp = temp.path;
  const discard = () => rm(tmp, { force: true }).then(temp.release);
  return new Promise<ReceivedUpload>((resolve, reject) => {
    const fields: Record<string, string> = {};
    let file: Promise<number> | undefined;
    let mimeType = '';
    let failed: HttpError | undefined;
    const fail = (err: HttpError) => {
      failed ??= err;
    };
    const parser = busboy({
      headers: req.headers,
      limits: { files: 1, fields: 20, fileSize: maxBytes, fieldSize: 4096 },
    });
    parser.on('field', (name, value) => (fields[name] = value));
    parser.on('file', (name, stream, info) => {
      if (name !== 'file' || file) {
        stream.resume();
        return;
      }
      mimeType = info.mimeType;
      let size = 0;
      stream.on('data', (chunk: Buffer) => (size += chunk.length));
      stream.on('limit', () =>
        fail(new HttpError(413, 'too_large', `The file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`)),
      );
      file = pipeline(stream, createWriteStream(tmp)).then(() => size);
    });
    parser.on('filesLimit', () => fail(new BadRequestError('Send one photo per request.')));
    let settled = false;
    const abandon = async (err: HttpError) => {
      if (settled) return;
      settled = true;
      await file?.catch(() => {});
      await discard();
      reject(err);
    };
    parser.on(
      'error',
      () => void abandon(new BadRequestError('The upload was cut off or is not valid multipart data.')),
    );
    req.on('aborted', () => void abandon(new BadRequestError('The upload was cancelled.')));
    parser.on('close', async () => {
      if (settled) return;
      settled = true;
      try {
        const size = file ? await file : 0;
        if (!failed && !file) failed = new BadRequestError('No file: put the image in the field "file".');
        if (!failed && size === 0) failed = new BadRequestError('The file is empty.');
        if (failed) {
          await discard();
          return reject(failed);
        }
        resolve({ path: tmp, size, fields, mimeType, discard });
      } catch {
        await discard();
        reject(new BadRequestError('The upload was cut off before it finished.'));
      }
    });
    req.pipe(parser);
  });
}
