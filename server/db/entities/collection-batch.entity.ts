import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** Propagules collected together: when, where and by whom. */
@Entity({ name: 'collection_batch' })
export class CollectionBatch {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 40, unique: true })
  code: string;

  @Column({ type: 'date', name: 'collected_on' })
  collectedOn: string;

  @Column({ type: 'varchar', length: 300 })
  place: string;

  @Column({ type: 'double precision', nullable: true })
  latitude: number | null;

  @Column({ type: 'double precision', nullable: true })
  longitude: number | null;

  @Column({ type: 'varchar', length: 120, default: '' })
  collector: string;

  @Column({ type: 'integer' })
  count: number;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'uuid', name: 'photo_id', nullable: true })
  photoId: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
