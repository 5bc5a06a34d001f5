import type { ModelVersionSummary } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { CardBody } from "@/components/ui/card";

function QueueItem({ version: v, own }: { version: ModelVersionSummary; own: boolean }) {
  return (
    <li className="flex items-center justify-between gap-3 px-4 py-3">
      <div>
        <p className="font-medium">
          {v.name} <span className="num text-muted">v{v.versionNumber}</span>
        </p>
        <p className="text-xs text-muted">
          {v.changeClass ?? "–"} change by {v.authorName ?? "–"}
          {own && " · you wrote it: another manager decides"}
        </p>
      </div>
      <ButtonLink to={paths.modelVersionReview.build(v.id)} size="sm" variant={own ? "secondary" : "primary"}>
        {own ? "View" : "Review"}
      </ButtonLink>
    </li>
  );
}

/**
 * The manager's review queue: versions in review written by others, which she may decide,
 * and apart from them her own (separation of duties: another manager decides those).
 */
export function ReviewQueue({ versions, userId }: { versions: ModelVersionSummary[]; userId: string }) {
  const toDecide = versions.filter((v) => v.authorId !== userId);
  const own = versions.filter((v) => v.authorId === userId);
  return (
    <>
      {toDecide.length === 0 ? (
        // One quiet line, as the desk's other empty panels: a big empty box would outweigh
        // the versions listed under it.
        <CardBody className="py-3">
          <p className="text-sm text-muted">{own.length > 0 ? "Nothing for you to decide: only your own version waits, for another manager." : "Nothing to review."}</p>
        </CardBody>
      ) : (
        <ul aria-label="Versions for you to decide" className="divide-y divide-line">
          {toDecide.map((v) => (
            <QueueItem key={v.id} version={v} own={false} />
          ))}
        </ul>
      )}
      {own.length > 0 && (
        <section aria-labelledby="own-in-review" className="border-t border-line">
          <h3 id="own-in-review" className="px-4 pt-3 text-xs font-semibold tracking-wider text-muted uppercase">
            Your own versions in review
          </h3>
          <ul className="divide-y divide-line">
            {own.map((v) => (
              <QueueItem key={v.id} version={v} own />
            ))}
          </ul>
        </section>
      )}
    </>
  );
}
