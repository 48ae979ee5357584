import type { SignChoiceSet, SignGeometry } from '@core/contracts';
import { ChoiceField } from '../common/fields';
import { useBoundField } from '../common/use-bound-field';
import { CmField } from './cm-field';

const AXES = [
  { value: 'x', label: 'x' },
  { value: 'y', label: 'y' },
  { value: 'z', label: 'z' },
] as const;

/** A loop or a wire's defaults when the teacher switches between them: the field point is kept. */
export function conductorOf(shape: 'loop' | 'wire'): SignGeometry['conductor'] {
  return shape === 'loop'
    ? { shape: 'loop', center: [0, 0, 0], radius: 0.05, axis: 'z', current: 'anticlockwise' }
    : { shape: 'wire', through: [0, 0, 0], axis: 'z', current: '+' };
}

/** The set-up the engine derives the answer from: the conductor, its current, the field point. */
export function GeometryFields({ choiceSet }: { choiceSet: SignChoiceSet }) {
  const conductor = useBoundField<SignGeometry['conductor']>('answer.geometry.conductor');
  const shape = conductor.value?.shape ?? 'loop';
  const base = 'answer.geometry';
  return (
    <div className="flex flex-col gap-4">
      <ChoiceField
        path={`${base}.conductor.shape`}
        label="Conductor"
        choices={[
          { value: 'loop', label: 'A circular loop' },
          { value: 'wire', label: 'A long straight wire' },
        ]}
        onPick={(next) => {
          if (next !== shape) conductor.set(conductorOf(next));
        }}
      />
      {shape === 'loop' ? (
        <>
          <CmField path={`${base}.conductor.radius`} label="Loop radius" />
          <PointFields path={`${base}.conductor.center`} legend="Loop centre" />
          <ChoiceField path={`${base}.conductor.axis`} label="The loop’s axis (it lies in the plane across it)" choices={AXES} />
          <ChoiceField
            path={`${base}.conductor.current`}
            label="Current, seen from the + side of the axis"
            choices={[
              { value: 'anticlockwise', label: 'Anticlockwise' },
              { value: 'clockwise', label: 'Clockwise' },
            ]}
          />
        </>
      ) : (
        <>
          <PointFields path={`${base}.conductor.through`} legend="The wire passes through" />
          <ChoiceField path={`${base}.conductor.axis`} label="The wire runs along" choices={AXES} />
          <ChoiceField
            path={`${base}.conductor.current`}
            label="Current flows towards"
            choices={[
              { value: '+', label: 'The + end of the axis' },
              { value: '-', label: 'The − end of the axis' },
            ]}
          />
        </>
      )}
      <PointFields path={`${base}.point`} legend="Field point P" />
      {choiceSet === 'sign' ? <ChoiceField path={`${base}.component`} label="The component whose sign is asked" choices={AXES} /> : null}
    </div>
  );
}

function PointFields({ path, legend }: { path: string; legend: string }) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-bold">{legend}</legend>
      <div className="grid grid-cols-3 gap-2">
        {(['x', 'y', 'z'] as const).map((axis, i) => (
          <CmField
            key={axis}
            path={`${path}.${i}`}
            label={
              <>
                <span className="sr-only">{legend}, </span>
                {axis}
              </>
            }
          />
        ))}
      </div>
    </fieldset>
  );
}
