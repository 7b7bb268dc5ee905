import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** An uploaded file: the bytes are in FileStorage under `storageKey`; `contentType` was read from the bytes. */
@Entity('stored_files')
export class StoredFile {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'varchar', length: 8 })
  storage: 'local' | 's3';

  @Column({ name: 'storage_key', type: 'varchar', length: 400 })
  storageKey: string;

  @Column({ name: 'content_type', type: 'varchar', length: 100 })
  contentType: string;

  @Column({ name: 'size_bytes', type: 'int' })
  sizeBytes: number;

  @Column({ name: 'original_name', type: 'varchar', length: 255 })
  originalName: string;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
