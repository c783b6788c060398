import { can } from '@shared/auth/permissions';
import { SUBMITTAL_STATUS_TEXT, type Submittal } from '@shared/schemas/submittals';
import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageSection } from '../../components/ui/PageSection';
import { useMe } from '../../features/me/api/get-me';
import { useMembers } from '../../features/members/api/get-members';
import { useProject } from '../../features/projects/api/get-project';
import { useSubmittal } from '../../features/submittals/api/get-submittal';
import { conflictingSubmittal, useUpdateSubmittal } from '../../features/submittals/api/mutations';
import { AttachFieldReport } from '../../features/submittals/components/AttachFieldReport';
import { AttachSheet } from '../../features/submittals/components/AttachSheet';
import { CommentForm, CommentList } from '../../features/submittals/components/Comments';
import { ItemList } from '../../features/submittals/components/ItemList';
import { ReviewerDecisions } from '../../features/submittals/components/ReviewerDecisions';
import { ReviewPanel } from '../../features/submittals/components/ReviewPanel';
import { StatusBadge } from '../../features/submittals/components/StatusBadge';
import { SubmittalForm } from '../../features/submittals/components/SubmittalForm';
import { UploadFiles } from '../../features/submittals/components/UploadFiles';
import { errorMessage } from '../../lib/api';
import { formatDate, formatDateTime } from '../../lib/format';

function RevisionChain({ s }: { s: Submittal }) {
  return (
    <nav aria-label="Revisions" className="flex flex-wrap items-center gap-2 text-sm">
      <span className="label-caps">Revisions</span>
      {s.revisions.map((r, i) => (
        <span key={r.id} className="flex items-center gap-2">
          {i > 0 ? <span aria-hidden="true">→</span> : null}
          {r.id === s.id ? (
            <span aria-current="page" className="font-semibold">
              Rev {r.revision} ({SUBMITTAL_STATUS_TEXT[r.status].label.toLowerCase()})
            </span>
          ) : (
            <Link to={`/projects/${s.projectId}/submittals/${r.id}`}>
              Rev {r.revision} ({SUBMITTAL_STATUS_TEXT[r.status].label.toLowerCase()})
            </Link>
          )}
        </span>
      ))}
    </nav>
  );
}

function EditDetails({ s }: { s: Submittal }) {
  const [open, setOpen] = useState(false);
  const members = useMembers(s.projectId);
  const update = useUpdateSubmittal(s.id);
  const [conflict, setConflict] = useState(false);
  if (!open)
    return (
      <div>
        <Button onClick={() => setOpen(true)}>Edit the details</Button>
      </div>
    );
  if (!members.data) return <Loading what="Loading the people of the project" />;
  return (
    <div className="flex flex-col gap-3">
      {conflict ? (
        <Notice tone="warning" title="Someone changed this submittal after you opened it." live>
          <p>The page now shows their version; your edit was not saved. Make it again on top of theirs.</p>
        </Notice>
      ) : null}
      <SubmittalForm
        key={s.version}
        members={members.data.members}
        withNumber={false}
        initial={{
          title: s.title,
          description: s.description,
          specSection: s.specSection,
          specTitle: s.specTitle,
          dueDate: s.dueDate,
          reviewerIds: s.reviewers.map((r) => r.id),
        }}
        submitLabel="Save the details"
        busyLabel="Saving…"
        onSubmit={async ({ number: _n, ...changes }) => {
          setConflict(false);
          try {
            await update.mutateAsync({ version: s.version, changes });
            setOpen(false);
          } catch (e) {
            if (conflictingSubmittal(e)) setConflict(true);
            else throw e;
          }
        }}
        onCancel={() => setOpen(false)}
      />
    </div>
  );
}

/** One revision of a submittal: what it is, its items, the review and the comments. */
export function SubmittalPage() {
  const { projectId = '', submittalId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const me = useMe();
  const submittal = useSubmittal(submittalId);
  if (!project) return null;
  if (submittal.isPending) return <Loading what="Loading the submittal" />;
  if (submittal.isError) return <Notice tone="caution" title={errorMessage(submittal.error)} live />;
  const s = submittal.data;
  if (s.projectId !== project.id)
    return <Notice tone="caution" title="This submittal belongs to another project." />;

  const open = project.archivedAt === null;
  const isDraft = s.status === 'draft';
  const mayEdit = open && isDraft && can(project.myRole, 'submittal.create');
  const mayComment = open && !s.readOnly && can(project.myRole, 'submittal.comment');
  const myReview =
    open && can(project.myRole, 'submittal.review')
      ? (s.reviewers.find((r) => r.id === me.data?.id) ?? null)
      : null;
  const latest = s.revisions[s.revisions.length - 1];

  return (
    <div className="flex flex-col gap-8">
      <title>{`${s.number} rev ${s.revision} · Submittals · Skinwright`}</title>
      <nav aria-label="Breadcrumb" className="-mt-2 text-sm">
        <Link to={`/projects/${project.id}/submittals`}>Submittals</Link> <span aria-hidden="true">/</span>{' '}
        {s.number}
      </nav>
      <header className="flex flex-col gap-3 border-b border-ink pb-3">
        <p className="label-caps">
          <span className="num">{s.specSection}</span> {s.specTitle}
        </p>
        <h2 className="flex flex-wrap items-baseline gap-3 text-2xl">
          <span className="num">{s.number}</span>
          <span>rev {s.revision}</span>
          <span className="font-normal">— {s.title}</span>
        </h2>
        <div className="flex flex-wrap items-center gap-4" data-testid="submittal-status">
          <StatusBadge status={s.status} />
          <RevisionChain s={s} />
        </div>
      </header>

      {s.readOnly ? (
        <Notice tone="info" title={`Revision ${s.revision} was decided and is kept as it was (read-only).`}>
          {latest && latest.id !== s.id ? (
            <p>
              The current revision is{' '}
              <Link to={`/projects/${project.id}/submittals/${latest.id}`}>revision {latest.revision}</Link>.
            </p>
          ) : null}
        </Notice>
      ) : null}

      <PageSection n={1} title="Details" id="details">
        <dl className="grid gap-x-8 gap-y-1 text-sm sm:grid-cols-[12rem_1fr]">
          <dt className="font-semibold">Submitter</dt>
          <dd>{s.submitter?.name ?? '—'}</dd>
          <dt className="font-semibold">Reviewers</dt>
          <dd>{s.reviewers.length > 0 ? s.reviewers.map((r) => r.name).join(', ') : 'none named yet'}</dd>
          <dt className="font-semibold">Review due</dt>
          <dd>{s.dueDate ? formatDate(s.dueDate) : '—'}</dd>
          <dt className="font-semibold">Submitted</dt>
          <dd>{s.submittedAt ? formatDateTime(s.submittedAt) : 'not yet'}</dd>
          {s.description ? (
            <>
              <dt className="font-semibold">Description</dt>
              <dd className="whitespace-pre-wrap">{s.description}</dd>
            </>
          ) : null}
        </dl>
        {mayEdit ? <EditDetails s={s} /> : null}
      </PageSection>

      <PageSection n={2} title="Items" id="items">
        <ItemList s={s} mayEdit={mayEdit} mayComment={mayComment} />
        {mayEdit ? (
          <div className="grid gap-4 lg:grid-cols-2">
            <AttachSheet
              projectId={project.id}
              submittalId={s.id}
              attached={s.items.flatMap((i) => (i.kind === 'sheet' ? [i.sheet.checkRunId] : []))}
            />
            <AttachFieldReport projectId={project.id} submittalId={s.id} />
            <UploadFiles submittalId={s.id} />
          </div>
        ) : null}
      </PageSection>

      <PageSection n={3} title="Review" id="review">
        {s.decision ? (
          <p className="font-semibold" data-testid="decision">
            <span aria-hidden="true">{SUBMITTAL_STATUS_TEXT[s.decision.decision].glyph} </span>
            {SUBMITTAL_STATUS_TEXT[s.decision.decision].label}
            <span className="font-normal"> — closed {formatDateTime(s.decision.at)}</span>
          </p>
        ) : null}
        <ReviewerDecisions s={s} />
        {open ? (
          <ReviewPanel s={s} maySubmit={can(project.myRole, 'submittal.submit')} me={myReview} />
        ) : null}
      </PageSection>

      <PageSection n={4} title="Comments" id="comments">
        <CommentList comments={s.comments.filter((c) => c.itemId === null)} />
        {s.comments.every((c) => c.itemId !== null) ? (
          <p className="text-sm text-ink-muted">No comment on the whole submittal yet.</p>
        ) : null}
        {mayComment ? (
          <CommentForm submittalId={s.id} itemId={null} label="Comment on the submittal" />
        ) : null}
      </PageSection>
    </div>
  );
}
