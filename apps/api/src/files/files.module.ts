import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ENV, Env } from '../config/env';
import { StoredFile } from './entities/stored-file.entity';
import { createFileStorage, FILE_STORAGE } from './file-storage';
import { FilesService } from './files.service';

/** Uploaded files behind one FileStorage: the data dir by default, S3-compatible storage when UPLOAD_STORAGE=s3. */
@Module({
  imports: [TypeOrmModule.forFeature([StoredFile])],
  providers: [{ provide: FILE_STORAGE, inject: [ENV], useFactory: (env: Env) => createFileStorage(env) }, FilesService],
  exports: [FilesService],
})
export class FilesModule {}
