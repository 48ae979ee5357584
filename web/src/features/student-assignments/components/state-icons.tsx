import type { JSX } from 'react';
import type { StudentAssignmentState } from '@core/contracts';
import { Svg, type IconProps } from '@/components/ui/icons';

// One shape per state, so a state reads without colour: a calendar, an empty ring, a half-filled ring,
// a ticked ring, a clock, a padlock.
const CalendarIcon = (p: IconProps) => (
  <Svg {...p}>
    <rect x="4" y="5" width="16" height="15" rx="2" />
    <path d="M4 10h16M9 3v4M15 3v4" />
  </Svg>
);
const RingIcon = (p: IconProps) => (
  <Svg {...p}>
    <circle cx="12" cy="12" r="8" />
  </Svg>
);
const HalfRingIcon = (p: IconProps) => (
  <Svg {...p}>
    <circle cx="12" cy="12" r="8" />
    <path d="M12 4a8 8 0 0 1 0 16z" fill="currentColor" />
  </Svg>
);
const DoneIcon = (p: IconProps) => (
  <Svg {...p}>
    <circle cx="12" cy="12" r="9" />
    <path d="M8 12.5l3 3 5-6" />
  </Svg>
);
const ClockIcon = (p: IconProps) => (
  <Svg {...p}>
    <circle cx="12" cy="12" r="9" />
    <path d="M12 7v5l3.5 2" />
  </Svg>
);
const LockIcon = (p: IconProps) => (
  <Svg {...p}>
    <rect x="5" y="11" width="14" height="9" rx="2" />
    <path d="M8 11V8a4 4 0 0 1 8 0v3" />
  </Svg>
);

export const STATE_ICONS: Record<StudentAssignmentState, (props: IconProps) => JSX.Element> = {
  upcoming: CalendarIcon,
  'not-started': RingIcon,
  'in-progress': HalfRingIcon,
  done: DoneIcon,
  late: ClockIcon,
  closed: LockIcon,
};

/** A small star: something the student has not opened yet. */
export const NewIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M12 3.5l2.4 5 5.4.7-4 3.8 1 5.4-4.8-2.6-4.8 2.6 1-5.4-4-3.8 5.4-.7z" />
  </Svg>
);

/** Two arrows round: a grade changed after a correction. */
export const UpdatedIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M19 8a7.5 7.5 0 0 0-13.5 1M5 16a7.5 7.5 0 0 0 13.5-1" />
    <path d="M19 3.5V8h-4.5M5 20.5V16h4.5" />
  </Svg>
);
