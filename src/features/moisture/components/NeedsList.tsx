import { Link } from 'react-router';
import { Notice } from '../../../components/ui/Notice';
import type { Problem } from '../evaluate';
import { vapourKindId, vapourValueId } from './VapourTable';

export interface NeedsLinks {
  /** The project's climate page. */
  climate: string;
  /** Where the indoor design conditions are edited (the project overview). */
  indoor: string;
  /** The assembly's build-up page. */
  buildup: string;
  mayEditClimate: boolean;
  mayEditIndoor: boolean;
  mayEditVapour: boolean;
}

function focusRow(layer: number) {
  const el =
    (document.getElementById(vapourValueId(layer)) as HTMLElement | null) ??
    (document.getElementById(vapourKindId(layer)) as HTMLElement | null) ??
    document.getElementById(`vapour-row-${layer}`);
  if (!el) return false;
  el.scrollIntoView?.({ block: 'center' });
  el.focus?.();
  return true;
}

/** What stands between the input and a result, each item linked to where it is entered. */
export function NeedsList({ problems, links }: { problems: readonly Problem[]; links: NeedsLinks }) {
  if (problems.length === 0) return null;
  return (
    <Notice tone="caution" title="No result yet — the calculation needs:" live>
      <ul className="list-disc pl-5" data-testid="moisture-needs">
        {problems.map((p) => (
          <li key={`${p.where.kind}-${'layer' in p.where ? p.where.layer : ''}-${p.text}`}>
            <Item problem={p} links={links} />
          </li>
        ))}
      </ul>
    </Notice>
  );
}

function Item({ problem, links }: { problem: Problem; links: NeedsLinks }) {
  const p = problem.subject
    ? {
        ...problem,
        text: `${problem.subject}: ${problem.text.charAt(0).toLowerCase()}${problem.text.slice(1)}`,
      }
    : problem;
  switch (p.where.kind) {
    case 'vapour': {
      const layer = p.where.layer;
      return links.mayEditVapour ? (
        <>
          <a
            href={`#vapour-row-${layer}`}
            onClick={(e) => {
              if (focusRow(layer)) e.preventDefault();
            }}
          >
            {p.text.replace(/\.$/, '')}
          </a>{' '}
          — in the table of layers above.
        </>
      ) : (
        <>{p.text.replace(/\.$/, '')} — someone who may edit the assembly enters it in the table above.</>
      );
    }
    case 'climate':
      return (
        <>
          {p.text.replace(/\.$/, '')} —{' '}
          {links.mayEditClimate ? (
            <Link to={`${links.climate}?edit=1`}>enter it on the project’s Climate page</Link>
          ) : (
            <>
              the project owner, architect or envelope consultant enters it on the{' '}
              <Link to={links.climate}>Climate page</Link>
            </>
          )}
          .
        </>
      );
    case 'indoor':
      return (
        <>
          {p.text.replace(/\.$/, '')} —{' '}
          {links.mayEditIndoor ? (
            <Link to={`${links.indoor}?edit=1`}>edit the project’s indoor design conditions</Link>
          ) : (
            <>the project owner or architect edits the indoor design conditions</>
          )}
          , or choose a humidity class on the <Link to={links.climate}>Climate page</Link>.
        </>
      );
    case 'buildup':
      return (
        <>
          {p.text.replace(/\.$/, '')} — <Link to={links.buildup}>put it right in the build-up</Link>.
        </>
      );
    default:
      return <>{p.text}</>;
  }
}
