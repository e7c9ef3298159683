import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A nursery tank or bucket the trees stand in. */
@Entity({ name: 'tank' })
export class Tank {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 80, unique: true })
  name: string;

  @Column({ type: 'double precision', name: 'volume_litres' })
  volumeLitres: number;

  /** The site whose salinity this tank is being brought to, when brining. */
  @Column({ type: 'uuid', name: 'target_site_id', nullable: true })
  targetSiteId: string | null;

  @Column({ type: 'text', default: '' })
  notes: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
