import type { ColumnType, Generated, Insertable, Selectable, Updateable } from 'kysely';

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;

// better-auth's own tables (created by its migrations; camelCase columns). Only the columns the app reads.
export interface UserTable {
  id: string;
  name: string;
  email: string;
  emailVerified: boolean;
  role: string | null;
  banned: boolean | null;
  createdAt: Timestamp;
  updatedAt: Timestamp;
}

export interface OrganizationTable {
  id: string;
  name: string;
  slug: string;
  createdAt: Timestamp;
}

export interface MemberTable {
  id: string;
  organizationId: string;
  userId: string;
  role: string;
  createdAt: Timestamp;
}

export interface InvitationTable {
  id: string;
  organizationId: string;
  email: string;
  role: string | null;
  status: string;
  expiresAt: Timestamp;
  inviterId: string;
  createdAt: Timestamp;
}

export interface RigTable {
  id: Generated<string>;
  /** The household: a better-auth organization. */
  household_id: string;
  created_by: string | null;
  name: string;
  vehicle: string;
  /** Battery bank, inverter, charging, routine and stay: the model's input minus the loads (shared/schemas/projection.ts). */
  power: ColumnType<unknown, string, string>;
  version: Generated<number>;
  seed_key: string | null;
  log_mapping: ColumnType<unknown, string | null | undefined, string | null>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface LoadTable {
  id: Generated<string>;
  rig_id: string;
  added_by: string | null;
  name: string;
  supply: 'dc' | 'ac';
  watts: number | null;
  amps: number | null;
  duty_percent: number;
  hours_per_day: number;
  start_hour: number | null;
  weekdays: number[] | null;
  when: 'always' | 'parked' | 'driving';
  status: 'installed' | 'candidate';
  quantity: number;
  essential: Generated<boolean>;
  position: number;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface CableRunTable {
  id: Generated<string>;
  rig_id: string;
  load_id: string | null;
  created_by: string | null;
  label: string;
  from_point: string;
  to_point: string;
  length_m: number;
  current_a: number | null;
  max_drop_percent: number;
  insulation_c: number;
  engine_space: boolean;
  /** Where it runs; the engine bay sets engine_space. */
  route: Generated<'cabin' | 'under-floor' | 'engine-bay'>;
  /** The cable's type; it sets insulation_c. */
  cable_type: Generated<'pvc' | 'xlpe' | 'marine' | 'welding' | 'other-60' | 'other-75' | 'high-temperature'>;
  return_path: 'cable' | 'chassis';
  continuous: boolean;
  purpose: 'general' | 'inverter';
  existing_awg: string | null;
  existing_mm2: number | null;
  /** The run feeds the rig's inverter: sized from its rating. */
  inverter_link: Generated<boolean>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface NoteTable {
  id: Generated<string>;
  rig_id: string;
  parent_id: string | null;
  target_kind: 'rig' | 'load' | 'cable-run' | 'reading';
  target_id: string | null;
  author_id: string | null;
  body: string;
  rig_version: number;
  target_snapshot: ColumnType<unknown, string | null, string | null>;
  resolved_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  edited_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  created_at: Timestamp;
}

export interface NoteReadTable {
  user_id: string;
  rig_id: string;
  read_at: ColumnType<Date, Date, Date>;
}

export interface RigHistoryTable {
  id: Generated<string>;
  rig_id: string;
  actor_id: string | null;
  actor_name: string;
  kind: HistoryKind;
  summary: string;
  days_parked_before: number | null;
  days_parked_after: number | null;
  created_at: Timestamp;
  /** A Fix's entry: the power system before and after it (jsonb), for History's undo. */
  undo: ColumnType<{ before: unknown; after: unknown } | null, string | null | undefined, string | null>;
  undone_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
}
export type HistoryKind = 'rig-created' | 'fix' | 'cable-run-added' | 'cable-run-edited' | 'cable-run-removed' | 'load-added' | 'load-edited' | 'load-removed' | 'reading-added' | 'reading-removed' | 'battery' | 'inverter' | 'charging' | 'routine' | 'stay' | 'rig' | 'member-joined' | 'member-left' | 'member-removed' | 'role-changed';

export interface EmailPrefsTable {
  user_id: string;
  reports_on: Generated<boolean>;
  report_weekday: Generated<number>;
  report_hour: Generated<number>;
  time_zone: Generated<string>;
  warnings_on: Generated<boolean>;
  warn_at: Generated<'tight' | 'short'>;
  note_emails_on: Generated<boolean>;
  updated_at: Timestamp;
}

/** A person's energy unit for every text, e-mails included; no row is amp-hours. */
export interface UnitPrefsTable {
  user_id: string;
  energy: Generated<'Ah' | 'Wh'>;
  updated_at: Timestamp;
}

export interface RigMarginTable {
  rig_id: string;
  state: 'comfortable' | 'tight' | 'short';
  falls: number;
  days_parked: number | null;
  checked_at: Timestamp;
  /** The last check that saw the rig Comfortable (null: never, or before this column). */
  comfortable_at: Timestamp | null;
}

export type EmailKind = 'report' | 'warning' | 'notes';
export type EmailStatus = 'queued' | 'sending' | 'sent' | 'failed';
export interface EmailLogTable {
  id: Generated<string>;
  idempotency_key: string;
  kind: EmailKind;
  user_id: string | null;
  rig_id: string | null;
  status: Generated<EmailStatus>;
  attempts: Generated<number>;
  last_error: string | null;
  to_address: string | null;
  subject: string | null;
  html: string | null;
  text: string | null;
  chart_png: Buffer | null;
  meta: ColumnType<unknown, string | null | undefined, string | null>;
  locked_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  created_at: Timestamp;
  sent_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
}

export interface UploadTable {
  id: Generated<string>;
  rig_id: string;
  kind: 'log' | 'photo';
  file_name: string;
  content_type: string;
  size_bytes: number;
  object_key: string;
  thumb_key: string | null;
  caption: Generated<string>;
  row_count: Generated<number>;
  error_count: Generated<number>;
  errors: ColumnType<unknown, string | null | undefined, string | null>;
  mapping: ColumnType<unknown, string | null | undefined, string | null>;
  created_by: string | null;
  created_at: Timestamp;
}

export interface ReadingTable {
  id: Generated<string>;
  rig_id: string;
  upload_id: string | null;
  at: ColumnType<Date, Date | string, Date | string>;
  voltage_v: number;
  current_a: number | null;
  soc_percent: number | null;
  rested: boolean;
  place: 'terminals' | 'device' | 'ground';
  note: Generated<string>;
  created_by: string | null;
  created_at: Timestamp;
}

export interface TripTable {
  id: Generated<string>;
  rig_id: string;
  created_by: string | null;
  name: string;
  /** ISO date (YYYY-MM-DD), kept as text so no time zone moves it. */
  start_date: string;
  active: Generated<boolean>;
  /** arrivalHour, batteryInCabin and legs (shared/schemas/trip.ts). */
  plan: ColumnType<unknown, string, string>;
  created_at: Generated<Date>;
  updated_at: Generated<Date>;
}

export interface Database {
  user: UserTable;
  organization: OrganizationTable;
  member: MemberTable;
  invitation: InvitationTable;
  rigs: RigTable;
  loads: LoadTable;
  cable_runs: CableRunTable;
  notes: NoteTable;
  note_reads: NoteReadTable;
  rig_history: RigHistoryTable;
  email_prefs: EmailPrefsTable;
  unit_prefs: UnitPrefsTable;
  rig_margin: RigMarginTable;
  email_log: EmailLogTable;
  uploads: UploadTable;
  readings: ReadingTable;
  invitation_sends: InvitationSendTable;
  trips: TripTable;
}

/** One invitation e-mail sent, for the limits per inviter and per household. */
export interface InvitationSendTable {
  id: Generated<string>;
  household_id: string;
  inviter_id: string;
  created_at: ColumnType<Date, Date | undefined, never>;
}

export type RigRow = Selectable<RigTable>;
export type NewRig = Insertable<RigTable>;
export type RigUpdate = Updateable<RigTable>;
export type LoadRow = Selectable<LoadTable>;
export type NewLoad = Insertable<LoadTable>;
