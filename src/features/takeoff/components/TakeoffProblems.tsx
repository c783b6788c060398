import type { TakeoffInput } from '@shared/calc/takeoff/schema';
import { FieldLink } from '../../../components/ui/FieldLink';
import { Notice } from '../../../components/ui/Notice';
import { type FieldProblems, problemText } from '../../../lib/field-problems';
import { useUnitSystem } from '../../../lib/unit-system';
import { describeTakeoffPath, takeoffPathMeasure } from '../describe';

/** What stands between the elevation and a takeoff, each linked to its box. */
export function TakeoffProblems({ problems, input }: { problems: FieldProblems; input: TakeoffInput }) {
  const system = useUnitSystem();
  return (
    <Notice tone="caution" title="No takeoff yet — the elevation needs:">
      <ul className="list-disc pl-5">
        {Object.entries(problems).map(([path, p]) => (
          <li key={path}>
            <FieldLink path={path}>{describeTakeoffPath(path, input)}</FieldLink>:{' '}
            {problemText(p, takeoffPathMeasure(path), system)}
          </li>
        ))}
      </ul>
    </Notice>
  );
}
