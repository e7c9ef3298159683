import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Tree } from './tree.entity.js';
import type { TreeStage } from '../../../shared/schemas/nursery.schema.js';

export type TreeEventKind = 'stage' | 'measurement' | 'move' | 'reserve' | 'note';

/** One entry in a tree's history: a stage change, a measurement, a move between tanks. */
@Entity({ name: 'tree_event' })
@Index('IDX_tree_event_tree_time', ['treeId', 'at'])
export class TreeEvent {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid', name: 'tree_id' })
  treeId: string;

  @ManyToOne(() => Tree, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tree_id' })
  tree: Relation<Tree>;

  @Column({ type: 'varchar', length: 12 })
  kind: TreeEventKind;

  @Column({ type: 'timestamptz' })
  at: Date;

  @Column({ type: 'uuid', name: 'by_id', nullable: true })
  byId: string | null;

  @Column({ type: 'varchar', length: 12, name: 'from_stage', nullable: true })
  fromStage: TreeStage | null;

  @Column({ type: 'varchar', length: 12, name: 'to_stage', nullable: true })
  toStage: TreeStage | null;

  @Column({ type: 'uuid', name: 'tank_id', nullable: true })
  tankId: string | null;

  @Column({ type: 'double precision', name: 'height_cm', nullable: true })
  heightCm: number | null;

  @Column({ type: 'integer', name: 'leaf_count', nullable: true })
  leafCount: number | null;

  @Column({ type: 'boolean', nullable: true })
  healthy: boolean | null;

  @Column({ type: 'varchar', length: 500, default: '' })
  note: string;

  @Column({ type: 'uuid', name: 'photo_id', nullable: true })
  photoId: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
