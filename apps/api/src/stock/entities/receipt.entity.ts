import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A delivery booked in (GLOSSARY "receipt"), numbered per company, with its lines and delivery note. */
@Entity('receipts')
export class Receipt {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'int' })
  number: number;

  @Column({ name: 'supplier_id', type: 'uuid', nullable: true })
  supplierId: string | null;

  @Column({ name: 'supplier_name', type: 'varchar', length: 160, nullable: true })
  supplierName: string | null;

  @Column({ name: 'delivery_note_number', type: 'varchar', length: 60, nullable: true })
  deliveryNoteNumber: string | null;

  @Column({ name: 'received_on', type: 'date' })
  receivedOn: string;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'delivery_note_file_id', type: 'uuid', nullable: true })
  deliveryNoteFileId: string | null;

  @Column({ name: 'received_by', type: 'uuid' })
  receivedBy: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
