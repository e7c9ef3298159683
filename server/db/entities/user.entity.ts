import { Check, Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '../../../shared/schemas/user.schema.js';

@Entity({ name: 'app_user' })
@Check('CHK_app_user_role', `"role" IN ('volunteer', 'coordinator', 'admin')`)
export class User {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-cased so the unique index matches however the user types it. */
  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** scrypt hash with its parameters; null for accounts that only use Google. */
  @Column({ type: 'varchar', length: 300, name: 'password_hash', nullable: true })
  passwordHash: string | null;

  @Column({ type: 'varchar', length: 20, default: 'volunteer' })
  role: Role;

  @Column({ type: 'varchar', length: 64, name: 'google_id', nullable: true, unique: true })
  googleId: string | null;

  @Column({ type: 'timestamptz', name: 'email_verified_at', nullable: true })
  emailVerifiedAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
