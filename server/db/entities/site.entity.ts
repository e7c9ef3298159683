import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** Numeric columns come back from pg as strings; this keeps them numbers. */
const asNumber = { to: (v: number | null) => v, from: (v: string | null) => (v === null ? null : Number(v)) };

/** A planting site; lengths in metres, elevations relative to the station's MLLW. */
@Entity({ name: 'site' })
export class Site {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 120, unique: true })
  name: string;

  @Column({ type: 'numeric', precision: 9, scale: 6, transformer: asNumber })
  latitude: number;

  @Column({ type: 'numeric', precision: 9, scale: 6, transformer: asNumber })
  longitude: number;

  @Column({ type: 'varchar', length: 64, name: 'time_zone' })
  timeZone: string;

  @Column({ type: 'varchar', length: 64, name: 'station_id' })
  stationId: string;

  @Column({ type: 'integer', name: 'time_offset_minutes', default: 0 })
  timeOffsetMinutes: number;

  @Column({ type: 'double precision', name: 'height_offset_m', default: 0 })
  heightOffsetM: number;

  @Column({ type: 'double precision', name: 'bed_elevation_m' })
  bedElevationM: number;

  @Column({ type: 'double precision', name: 'route_elevation_m' })
  routeElevationM: number;

  @Column({ type: 'varchar', length: 120, name: 'launch_name', default: '' })
  launchName: string;

  @Column({ type: 'double precision', name: 'launch_distance_m', default: 0 })
  launchDistanceM: number;

  @Column({ type: 'double precision', name: 'working_depth_m', default: 0.3 })
  workingDepthM: number;

  @Column({ type: 'double precision', name: 'craft_draft_m', default: 0.15 })
  craftDraftM: number;

  @Column({ type: 'double precision', name: 'draft_margin_m', default: 0.1 })
  draftMarginM: number;

  @Column({ type: 'integer', name: 'min_window_minutes', default: 120 })
  minWindowMinutes: number;

  @Column({ type: 'boolean', name: 'include_civil_twilight', default: false })
  includeCivilTwilight: boolean;

  @Column({ type: 'double precision', name: 'salinity_ppt', nullable: true })
  salinityPpt: number | null;

  @Column({ type: 'text', default: '' })
  notes: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
