/**
 * A site: where a window is on the Earth, its clock (standard-time offset and daylight-saving rule)
 * and the air the sun's light crosses.
 */
import type { DaylightSavingRule } from '../time';

/** Where the window is. */
export interface Site {
  /** [°] −90…90, north positive */
  latitude: number;
  /** [°] −180…180, east positive */
  longitude: number;
  /** Standard-time offset from UTC [h], −12…+14, east positive. */
  utcOffset: number;
  /** [m] above sea level; default 0. */
  elevation?: number;
  /** Mean air pressure [hPa] for refraction; default: standard atmosphere at the elevation. */
  pressure?: number;
  /** Mean air temperature [°C] for refraction; default 12. */
  temperature?: number;
  /** The local clock's daylight-saving rule; none: local standard time all year. */
  daylightSaving?: DaylightSavingRule;
}
