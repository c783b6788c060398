import type { TakeoffInput } from '@shared/calc/takeoff/schema';
import { Notice } from '../../../components/ui/Notice';
import { type FieldProblems, fieldDomId, problemText } from '../../../lib/field-problems';
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
            <a
              href={`#${fieldDomId(path)}`}
              onClick={(e) => {
                const el = document.getElementById(fieldDomId(path));
                if (!el) return;
                e.preventDefault();
                el.scrollIntoView({ block: 'center' });
                el.focus?.();
              }}
            >
              {describeTakeoffPath(path, input)}
            </a>
            : {problemText(p, takeoffPathMeasure(path), system)}
          </li>
        ))}
      </ul>
    </Notice>
  );
}
