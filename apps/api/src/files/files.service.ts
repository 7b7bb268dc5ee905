import { BadRequestException, Inject, Injectable, Logger, NotFoundException, UnsupportedMediaTypeException } from '@nestjs/common';
import { fromBuffer } from 'file-type';
import { createHash, randomUUID } from 'node:crypto';
import { EntityManager } from 'typeorm';
import { StoredFile } from './entities/stored-file.entity';
import { FILE_STORAGE, FileStorage } from './file-storage';

/** A file as multer hands it over. */
export interface UploadedFileInput {
  buffer: Buffer;
  originalname: string;
  size: number;
}

/** The kinds of document Potlife accepts, by the type read from the bytes. */
export const DOCUMENT_TYPES: Record<string, { ext: string; label: string }> = {
  'application/pdf': { ext: 'pdf', label: 'PDF' },
  'image/jpeg': { ext: 'jpg', label: 'JPEG' },
  'image/png': { ext: 'png', label: 'PNG' },
};

export interface FileContent {
  file: StoredFile;
  body: Buffer;
  /** the original name with the extension of the type found in the bytes */
  downloadName: string;
}

/**
 * Uploaded files: the type is read from the content (file-type), never from the name; the bytes
 * go to FileStorage and a `stored_files` row records where, inside the caller's transaction.
 */
@Injectable()
export class FilesService {
  private readonly logger = new Logger(FilesService.name);

  constructor(@Inject(FILE_STORAGE) private readonly storage: FileStorage) {}

  /** The accepted type of `buffer`, or 415 naming what it seems to be. */
  async detectType(buffer: Buffer, accepted: Record<string, { ext: string; label: string }>, what: string): Promise<{ mime: string; ext: string }> {
    const found = await fromBuffer(buffer);
    if (!found || !accepted[found.mime]) {
      const labels = Object.values(accepted).map((a) => a.label);
      const list = `${labels.slice(0, -1).join(', ')} or ${labels[labels.length - 1]}`;
      throw new UnsupportedMediaTypeException({
        message: `${what} must be a ${list} file; this one ${found ? `is ${found.ext.toUpperCase()} (${found.mime})` : 'is not a type Potlife recognises (plain text?)'}, whatever its name says`,
        code: 'unsupported_media_type',
      });
    }
    return { mime: found.mime, ext: accepted[found.mime]!.ext };
  }

  /**
   * Checks and stores an upload under `<companyId>/<folder>/<id>.<ext>` and records it with
   * `manager`. The bytes are written first; if the transaction then fails, call `discard`.
   */
  async store(
    manager: EntityManager,
    companyId: string,
    userId: string,
    upload: UploadedFileInput | undefined,
    opts: { folder: string; what: string; field: string; accepted?: Record<string, { ext: string; label: string }> },
  ): Promise<StoredFile> {
    if (!upload || !upload.buffer || upload.size === 0) {
      throw new BadRequestException({ message: `${opts.field}: attach ${opts.what.toLowerCase()} as the multipart form field "${opts.field}"`, code: 'validation_failed' });
    }
    const type = await this.detectType(upload.buffer, opts.accepted ?? DOCUMENT_TYPES, opts.what);
    const id = randomUUID();
    const key = `${companyId}/${opts.folder}/${id}.${type.ext}`;
    await this.storage.put(key, upload.buffer, type.mime);
    const repo = manager.getRepository(StoredFile);
    try {
      return await repo.save(
        repo.create({
          id,
          companyId,
          storage: this.storage.kind,
          storageKey: key,
          contentType: type.mime,
          sizeBytes: upload.buffer.length,
          originalName: cleanName(upload.originalname),
          sha256: createHash('sha256').update(upload.buffer).digest('hex'),
          createdBy: userId,
        }),
      );
    } catch (err) {
      await this.discard(key);
      throw err;
    }
  }

  /** Removes stored bytes whose record was never committed; logs rather than throws. */
  async discard(key: string): Promise<void> {
    try {
      await this.storage.delete(key);
    } catch (err) {
      this.logger.warn(`Could not remove ${key}: ${err instanceof Error ? err.message : String(err)}`);
    }
  }

  /** A company's file with its bytes; another company's answers 404. */
  async read(manager: EntityManager, companyId: string, fileId: string): Promise<FileContent> {
    const file = await manager.getRepository(StoredFile).findOneBy({ id: fileId, companyId });
    if (!file) {
      throw new NotFoundException('File not found');
    }
    const body = await this.storage.get(file.storageKey);
    const ext = DOCUMENT_TYPES[file.contentType]?.ext ?? file.storageKey.split('.').pop() ?? 'bin';
    const base = file.originalName.replace(/\.[^.]*$/, '') || 'file';
    return { file, body, downloadName: `${base}.${ext}` };
  }
}

/** A file name safe to keep and to send back in Content-Disposition. */
export function cleanName(name: string | undefined): string {
  const base = (name ?? '').split(/[\\/]/).pop() ?? '';
  const clean = base.replace(/[^\w.\- ]/g, '_').slice(0, 200).trim();
  return clean || 'upload';
}
