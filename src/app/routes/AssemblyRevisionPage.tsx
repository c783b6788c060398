import { Link, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useRevision } from '../../features/assemblies/api/get-revision';
import { RevisionHistory } from '../../features/assemblies/components/RevisionHistory';
import { errorMessage } from '../../lib/api';
import { useAssemblyFrame } from '../layout/AssemblyLayout';
import { revisionOf } from '../route-params';
import { SavedRevisionView, useBuilderLibrary } from './AssemblyBuilderPage';

/** An older revision, read-only, exactly as it was saved (input and stored result). */
export function AssemblyRevisionPage() {
  const { project, assembly: a } = useAssemblyFrame();
  const n = revisionOf(useParams().revision);
  const rev = useRevision(a.id, n ?? 1);
  const library = useBuilderLibrary(project);

  if (n === null) return <Notice tone="caution" title="No such revision." />;
  if (rev.isPending) return <Loading what={`Loading revision ${n}`} />;
  if (rev.isError) return <Notice tone="caution" title={errorMessage(rev.error)} live />;

  const r = rev.data;
  const base = `/projects/${project.id}/assemblies`;
  const isCurrent = r.revision === a.revision;

  return (
    <>
      <title>{`${r.input.name}, rev. ${r.revision} · ${project.name} · Skinwright`}</title>
      <SavedRevisionView
        revision={r}
        what={`Revision ${r.revision} of ${a.revision} ·`}
        name={r.input.name}
        bridgeValues={library.bridgeValues}
        detail={r.note ? <p className="mt-1 italic">“{r.note}”</p> : null}
      >
        {isCurrent ? null : (
          <Notice tone="warning" title={`An older revision — revision ${a.revision} is current.`}>
            <p>
              <Link to={`${base}/${a.id}`}>Open the current revision</Link>
              <span aria-hidden="true"> · </span>
              <Link to={`${base}/compare?ids=${a.id},${a.id}&rev=${r.revision},`}>
                Compare this revision with the current one
              </Link>
            </p>
          </Notice>
        )}
      </SavedRevisionView>
      <RevisionHistory
        projectId={project.id}
        assemblyId={a.id}
        currentRevision={a.revision}
        openRevision={r.revision}
      />
    </>
  );
}
