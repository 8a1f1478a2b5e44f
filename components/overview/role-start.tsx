/**
 * Each role's start on the overview: what that person opens the product for. Server Components; the data
 * comes from the data layer, which checks the permission again.
 */
import Link from "next/link";
import { Card, CardBody, CardHeader, VerdictBadge, buttonClasses } from "@/components/ui";
import { ROLE_LABELS, type Role } from "@/lib/roles";
import type { AccessContext } from "@/lib/server/access";
import { listChecks } from "@/lib/server/checks";
import { fleetMatrix } from "@/lib/server/fleet";
import { listTeam } from "@/lib/server/team";
import { listCourses, listResults } from "@/lib/server/training";
import { savedCheckTitle } from "@/lib/format";

const dayMonth = (iso: string) => new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });

function firstOfMonth(now = new Date()): string {
  return `${now.getUTCFullYear()}-${String(now.getUTCMonth() + 1).padStart(2, "0")}-01`;
}

/** Counter staff (and owners): the last checks saved here, and a new one. */
export async function RecentChecks({ access }: { access: AccessContext }) {
  const recent = await listChecks(access, { sort: "createdAt", dir: "desc", page: 1, pageSize: 5 });
  return (
    <Card as="section" aria-labelledby="overview-recent-title">
      <CardHeader titleId="overview-recent-title" title="Recent checks" description="The last checks saved here, newest first." />
      <CardBody>
        {recent.rows.length ? (
          <ul className="divide-y divide-rule">
            {recent.rows.map((row) => (
              <li key={row.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-2.5">
                <VerdictBadge status={row.level} size="sm" />
                <Link href={`/checks/${row.id}`} className="min-w-0 flex-1 font-medium text-ink underline-offset-2 hover:underline">
                  {savedCheckTitle(row)}
                </Link>
                <span className="num text-sm text-ink-soft">{dayMonth(row.createdAt)}</span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-sm text-ink-soft">No check saved yet.</p>
        )}
        <div className="mt-4 flex flex-wrap gap-3">
          <Link href="/check" className={buttonClasses({ variant: "primary", size: "sm" })}>
            New check
          </Link>
          <Link href="/checks" className={buttonClasses({ variant: "secondary", size: "sm" })}>
            Every saved check
          </Link>
        </div>
      </CardBody>
    </Card>
  );
}

/** Fleet managers: how the fleet's vehicles and trailers pair, at a glance. */
export async function FleetAtAGlance({ access }: { access: AccessContext }) {
  const matrix = await fleetMatrix(access, { page: 1, pageSize: 5, colPage: 1, colPageSize: 4 });
  const counts = matrix.counts;
  return (
    <Card as="section" aria-labelledby="overview-fleet-title">
      <CardHeader titleId="overview-fleet-title" title="The fleet's pairings" description={`${matrix.totalRows} vehicles × ${matrix.totalColumns} trailers and accessories.`} />
      <CardBody>
        {counts ? (
          <ul className="flex flex-wrap gap-3" aria-label="Pairs by verdict">
            {(Object.keys(counts) as Array<keyof typeof counts>).map((level) => (
              <li key={level} className="flex items-center gap-2 rounded-md border border-rule px-3 py-2">
                <VerdictBadge status={level} size="sm" />
                <span className="num text-lg font-semibold text-ink">{counts[level]}</span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-sm text-ink-soft">The pairings are being rechecked after a change: the counts follow in a moment. Open them to see each page.</p>
        )}
        <div className="mt-4 flex flex-wrap gap-3">
          <Link href="/fleet/matrix" className={buttonClasses({ variant: "primary", size: "sm" })}>
            Open the pairings
          </Link>
          <Link href="/fleet/vehicles" className={buttonClasses({ variant: "secondary", size: "sm" })}>
            Vehicles
          </Link>
        </div>
      </CardBody>
    </Card>
  );
}

/** Trainers: their courses and how the learners are doing. */
export async function TrainingAtAGlance({ access }: { access: AccessContext }) {
  const [courses, results] = await Promise.all([listCourses(access), listResults(access)]);
  const learners = new Set(results.map((row) => row.userId)).size;
  const attempts = results.reduce((sum, row) => sum + row.attempts, 0);
  const right = results.reduce((sum, row) => sum + row.latestCorrect, 0);
  const asked = results.reduce((sum, row) => sum + row.total, 0);
  return (
    <Card as="section" aria-labelledby="overview-training-title">
      <CardHeader titleId="overview-training-title" title="Courses and learners" description="The shop's courses, and the learners' latest answers." />
      <CardBody>
        <dl className="grid grid-cols-3 gap-3 text-sm">
          <div>
            <dt className="text-ink-soft">Learners</dt>
            <dd className="num text-lg font-semibold text-ink">{learners}</dd>
          </div>
          <div>
            <dt className="text-ink-soft">Attempts</dt>
            <dd className="num text-lg font-semibold text-ink">{attempts}</dd>
          </div>
          <div>
            <dt className="text-ink-soft">Steps right, latest</dt>
            <dd className="num text-lg font-semibold text-ink">{asked ? `${Math.round((right / asked) * 100)} %` : "–"}</dd>
          </div>
        </dl>
        {courses.length ? (
          <ul className="mt-4 divide-y divide-rule">
            {courses.slice(0, 5).map((course) => (
              <li key={course.id} className="flex items-center justify-between gap-3 py-2">
                <Link href={`/training/courses/${course.id}`} className="font-medium text-ink underline-offset-2 hover:underline">
                  {course.title}
                </Link>
                <span className="num text-sm text-ink-soft">{course.lessonCount === 1 ? "1 example" : `${course.lessonCount} examples`}</span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="mt-4 text-sm text-ink-soft">No course yet.</p>
        )}
        <div className="mt-4 flex flex-wrap gap-3">
          <Link href="/training" className={buttonClasses({ variant: "primary", size: "sm" })}>
            Training
          </Link>
          <Link href="/training/results" className={buttonClasses({ variant: "secondary", size: "sm" })}>
            Learners&apos; results
          </Link>
        </div>
      </CardBody>
    </Card>
  );
}

/** Owners: the team, and the month's activity. */
export async function TeamAndActivity({ access }: { access: AccessContext }) {
  const [team, month] = await Promise.all([listTeam(access), listChecks(access, { sort: "createdAt", dir: "desc", page: 1, pageSize: 5, from: firstOfMonth() })]);
  const byRole = new Map<Role, number>();
  for (const member of team.members) byRole.set(member.role as Role, (byRole.get(member.role as Role) ?? 0) + 1);
  return (
    <Card as="section" aria-labelledby="overview-team-title">
      <CardHeader titleId="overview-team-title" title="The team and this month" description="Who works here, and the checks saved since the first of the month." />
      <CardBody>
        <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-3">
          {[...byRole].map(([role, n]) => (
            <div key={role}>
              <dt className="text-ink-soft">{ROLE_LABELS[role]}</dt>
              <dd className="num text-lg font-semibold text-ink">{n}</dd>
            </div>
          ))}
          <div>
            <dt className="text-ink-soft">Invitations open</dt>
            <dd className="num text-lg font-semibold text-ink">{team.pending.length}</dd>
          </div>
          <div>
            <dt className="text-ink-soft">Checks saved this month</dt>
            <dd className="num text-lg font-semibold text-ink">{month.total}</dd>
          </div>
        </dl>
        <div className="mt-4 flex flex-wrap gap-3">
          <Link href="/team" className={buttonClasses({ variant: "primary", size: "sm" })}>
            The team
          </Link>
          <Link href="/checks" className={buttonClasses({ variant: "secondary", size: "sm" })}>
            Saved checks
          </Link>
        </div>
      </CardBody>
    </Card>
  );
}
