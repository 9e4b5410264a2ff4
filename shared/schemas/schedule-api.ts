// Answers of the take-off, schedule and compare API: shared so the client reads the same shapes
// the server sends.
import type { OptionComparison } from '../analysis/compare';
import type { ProjectTakeoff, RoomTakeoff } from '../analysis/finish-takeoff';
import type { Schedule } from '../analysis/schedule-lines';
import type { TakeoffSettings } from '../analysis/takeoff-settings';
import type { MoneySettings } from '../units/money';

export interface OptionRef {
  id: string;
  label: string;
}

export interface ProjectTakeoffAnswer {
  project: { id: string; name: string };
  settings: TakeoffSettings;
  rooms: {
    id: string;
    name: string;
    options: OptionRef[];
    counted: OptionRef | null;
    chosenOptionId: string | null;
    takeoff: RoomTakeoff | null;
  }[];
  totals: ProjectTakeoff;
}

export interface ScheduleAnswer {
  project: { id: string; name: string };
  /** The studio's currency and locale for the prices. */
  money?: MoneySettings;
  /** Whom the project is for, for the printed schedule's header. */
  client?: { name: string };
  room: { id: string; name: string };
  option: OptionRef & { note: string };
  settings: TakeoffSettings;
  schedule: Schedule;
}

export interface CompareAnswer {
  project: { id: string; name: string };
  money?: MoneySettings;
  settings: TakeoffSettings;
  rooms: {
    id: string;
    name: string;
    chosenOptionId: string | null;
    options: (OptionRef & OptionComparison & { chosen: boolean })[];
  }[];
}
