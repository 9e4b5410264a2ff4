// The ordered list of migrations. Add a new file and one line here; never edit a landed one.
import type { Migration } from 'kysely';
import * as m0001 from './0001_create_studios';
import * as m0002 from './0002_create_rooms';
import * as m0003 from './0003_create_finishes';
import * as m0004 from './0004_create_presentations';
import * as m0005 from './0005_create_rate_limits';
import * as m0006 from './0006_notify_presentation_changes';
import * as m0007 from './0007_record_sent_mail';
import * as m0008 from './0008_drop_sign_in_failures';
import * as m0009 from './0009_project_states_and_kept_choices';
import * as m0010 from './0010_piece_kinds';
import * as m0011 from './0011_drop_presentation_requests';
import * as m0012 from './0012_option_versions_and_paint_litres';
import * as m0013 from './0013_queued_mail';
import * as m0016 from './0016_piece_models';
import * as m0017 from './0017_notify_piece_model_changes';

export const migrations: Record<string, Migration> = {
  '0001_create_studios': m0001,
  '0002_create_rooms': m0002,
  '0003_create_finishes': m0003,
  '0004_create_presentations': m0004,
  '0005_create_rate_limits': m0005,
  '0006_notify_presentation_changes': m0006,
  '0007_record_sent_mail': m0007,
  '0008_drop_sign_in_failures': m0008,
  '0009_project_states_and_kept_choices': m0009,
  '0010_piece_kinds': m0010,
  '0011_drop_presentation_requests': m0011,
  '0012_option_versions_and_paint_litres': m0012,
  '0013_queued_mail': m0013,
  '0016_piece_models': m0016,
  '0017_notify_piece_model_changes': m0017,
};
