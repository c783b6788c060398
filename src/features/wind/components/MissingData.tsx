import { type EngineMessage, messageText } from '@shared/format';
import type { MouseEvent } from 'react';
import { Link } from 'react-router';
import { Notice } from '../../../components/ui/Notice';
import type { SiteProblem } from '../evaluate';
import { windFieldId } from '../form';

const FIELD: Record<string, string> = {
  girtSpacing: 'Design girt spacing',
  clipSpacing: 'Design clip spacing',
  spanCondition: 'Span condition of the table',
  deflectionLimit: 'Deflection limit of the table',
  rows: 'Load–span table rows',
  span: 'span',
  allowableInward: 'allowable inward',
  allowableOutward: 'allowable outward',
  allowableDeflectionPressure: 'deflection pressure',
  allowableLoad: 'Clip rated load',
  fastenerCapacity: 'Fastener capacity',
  fastenersPerClip: 'Fasteners per clip',
  panelModuleWidth: 'Panel module width',
  continuityFactor: 'Continuity factor',
  deflectionWindFactor: 'Deflection wind factor',
};

/** Plain words for a form path: "Load–span table, row 3: span". */
export function describeWindField(path: string): string {
  const parts = path.split('.');
  if (parts[0] === 'rows' && parts[1] !== undefined) {
    const row = `Load–span table, row ${Number(parts[1]) + 1}`;
    return parts[2] ? `${row}: ${FIELD[parts[2]] ?? parts[2]}` : row;
  }
  return FIELD[path] ?? path;
}

const jump = (id: string) => (e: MouseEvent) => {
  const el = document.getElementById(id);
  if (!el) return;
  e.preventDefault();
  el.scrollIntoView({ block: 'center' });
  if (el instanceof HTMLElement) el.focus();
};

/** Where each thing `windInputFor` can report missing is entered. */
function MissingItem({ item, projectId }: { item: EngineMessage; projectId: string }) {
  const text = messageText(item);
  if (item.code === 'wind_missing')
    return (
      <li>
        <Link to={`/projects/${projectId}/wind`}>{text}</Link> — entered once per project on its wind data
        page
      </li>
    );
  if (item.code === 'panel_missing')
    return (
      <li>
        <a href="#panel-heading">{text}</a> — enter it under “Inputs — panel and clip” below
      </li>
    );
  return <li>{text}</li>;
}

/**
 * What stands between the inputs and a schedule: data the project lacks (linked to the page that holds it), problems
 * with the project's data, and values on this page that are not accepted yet (linked to their fields).
 */
export function MissingData({
  projectId,
  missing,
  site,
  errors,
}: {
  projectId: string;
  missing: readonly EngineMessage[];
  site: readonly SiteProblem[];
  errors: Record<string, string>;
}) {
  const fieldErrors = Object.entries(errors);
  if (missing.length === 0 && site.length === 0 && fieldErrors.length === 0) return null;
  return (
    <Notice tone="caution" title="No schedule yet — the calculation needs:">
      <ul className="list-disc pl-5" data-testid="wind-missing">
        {missing.map((m) => (
          <MissingItem key={m.code} item={m} projectId={projectId} />
        ))}
        {site.map((s) => (
          <li key={s.text}>
            {s.text} —{' '}
            {s.where === 'site' ? (
              <Link to={`/projects/${projectId}?edit=1`}>correct the project’s site data</Link>
            ) : (
              <Link to={`/projects/${projectId}/wind`}>correct the project’s wind data</Link>
            )}
          </li>
        ))}
        {fieldErrors.map(([path, message]) => (
          <li key={path}>
            <a href={`#${windFieldId(path)}`} onClick={jump(windFieldId(path))}>
              {describeWindField(path)}
            </a>
            : {message}
          </li>
        ))}
      </ul>
    </Notice>
  );
}
