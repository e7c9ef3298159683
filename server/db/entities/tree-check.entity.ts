import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique, type Relation } from 'typeorm';
import { MonitoringVisit } from './monitoring-visit.entity.js';
import { Tree } from './tree.entity.js';

export type TreeCondition = 'alive' | 'lost' | 'missing';

/** One planted tree's condition at one monitoring visit. */
@Entity({ name: 'tree_check' })
@Unique('UQ_tree_check_visit_tree', ['visitId', 'treeId'])
@Check('CHK_tree_check_condition', `"condition" IN ('alive', 'lost', 'missing')`)
export class TreeCheck {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid', name: 'visit_id' })
  visitId: string;

  @ManyToOne(() => MonitoringVisit, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'visit_id' })
  visit: Relation<MonitoringVisit>;

  @Index()
  @Column({ type: 'uuid', name: 'tree_id' })
  treeId: string;

  @ManyToOne(() => Tree, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tree_id' })
  tree: Relation<Tree>;

  @Column({ type: 'varchar', length: 8 })
  condition: TreeCondition;

  @Column({ type: 'double precision', name: 'height_cm', nullable: true })
  heightCm: number | null;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'uuid', name: 'photo_id', nullable: true })
  photoId: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
