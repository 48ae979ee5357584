import type { CheckpointKind } from '@core/contracts';
import { Svg, type IconProps } from '@/components/ui/icons';

// One drawn icon per checkpoint kind (24-unit grid, current text colour). Each kind also has its short
// label beside the icon, so no kind is told apart by colour or shape alone.

/** Three choices, the first one ticked. */
const ChoiceIcon = (p: IconProps) => (
  <Svg {...p}>
    <circle cx="5.5" cy="6" r="2.2" fill="currentColor" />
    <circle cx="5.5" cy="12" r="2.2" />
    <circle cx="5.5" cy="18" r="2.2" />
    <path d="M10.5 6h10M10.5 12h8M10.5 18h9" />
  </Svg>
);

/** A meter dial with its needle: a measured value. */
const NumericIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M3.5 17a8.5 8.5 0 0 1 17 0" />
    <path d="M12 17l4.2-6.2M6.2 12.5l1.2.9M12 8.5v1.5M17.8 12.5l-1.2.9" />
    <circle cx="12" cy="17" r="1.4" fill="currentColor" />
  </Svg>
);

/** A line of writing with a text cursor. */
const ShortTextIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M3 18h11" />
    <path d="M3 13.5l2.8-7.5 2.8 7.5M4.1 11h3.4" />
    <path d="M18 4.5v15M16 4.5h4M16 19.5h4" />
  </Svg>
);

/** A root sign over an expression: an equation card. */
const EquationIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M2.5 13h2.5l3 6.5 4.5-15h9" />
    <path d="M14.5 9.5l5 5M19.5 9.5l-5 5" />
  </Svg>
);

/** Plus over minus: which sign or direction. */
const SignIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M12 3.5v8M8 7.5h8M8 17.5h8" />
    <path d="M4 21h16" strokeWidth={1.4} />
  </Svg>
);

/** An eye with a question mark for a pupil: predict, then observe. */
const PredictionIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M2 12s3.6-6.5 10-6.5S22 12 22 12s-3.6 6.5-10 6.5S2 12 2 12z" />
    <path d="M10.3 10.3a1.8 1.8 0 1 1 2.6 1.6c-.6.3-.9.7-.9 1.3" />
    <path d="M12 15.6v.01" />
  </Svg>
);

/** A page with a folded corner. */
const NoteIcon = (p: IconProps) => (
  <Svg {...p}>
    <path d="M5 3.5h9.5l4.5 4.5v12.5H5z" />
    <path d="M14.5 3.5V8H19M8 12h8M8 16h5" />
  </Svg>
);

export const KIND_ICONS: Record<CheckpointKind, (props: IconProps) => React.JSX.Element> = {
  'multiple-choice': ChoiceIcon,
  numeric: NumericIcon,
  'short-text': ShortTextIcon,
  equation: EquationIcon,
  sign: SignIcon,
  prediction: PredictionIcon,
  note: NoteIcon,
};

/** The word on a timeline marker: short enough for a crowded timeline. */
export const KIND_SHORT_LABELS: Record<CheckpointKind, string> = {
  'multiple-choice': 'Choice',
  numeric: 'Number',
  'short-text': 'Words',
  equation: 'Equation',
  sign: 'Sign',
  prediction: 'Predict',
  note: 'Note',
};

export function KindIcon({ kind, ...props }: IconProps & { kind: CheckpointKind }) {
  const Icon = KIND_ICONS[kind];
  return <Icon {...props} />;
}
