import type { Metadata } from "next";
import { Card, CardBody, CardHeader, EmptyRow, PageHeader, TBody, TD, TH, THead, TR, Table } from "@/components/ui";
import { ROLE_LABELS } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { listTeam } from "@/lib/server/team";
import { InviteForm } from "./invite-form";
import { RemoveMember, RevokeInvitation, RoleSelect } from "./member-actions";

export const metadata: Metadata = { title: "Team" };

const dateFormat = new Intl.DateTimeFormat("en", { day: "numeric", month: "short", year: "numeric" });

export default async function TeamPage() {
  const access = await requirePage("team.manage", "/team");
  const { members, pending } = await listTeam(access);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Team" description={`Who works in ${access.organisation.name}, and as what.`} />
      <Card>
        <CardHeader title="Invite someone" description="They get a link by e-mail that works once, for seven days." />
        <CardBody>
          <InviteForm />
        </CardBody>
      </Card>
      <Card>
        <CardHeader title="Members" description={`${members.length} ${members.length === 1 ? "person" : "people"}`} />
        <Table caption="Members" hideCaption>
          <THead>
            <TR>
              <TH>Name</TH>
              <TH>E-mail</TH>
              <TH>Role</TH>
              <TH>Joined</TH>
              <TH>
                <span className="sr-only">Actions</span>
              </TH>
            </TR>
          </THead>
          <TBody>
            {members.map((member) => (
              <TR key={member.membershipId}>
                <TD className="font-medium">
                  {member.name}
                  {member.userId === access.user.id ? <span className="ml-1.5 text-xs font-normal text-ink-soft">(you)</span> : null}
                </TD>
                <TD>{member.email}</TD>
                <TD>
                  <RoleSelect membershipId={member.membershipId} role={member.role} name={member.name} />
                </TD>
                <TD className="text-ink-soft">{dateFormat.format(member.joinedAt)}</TD>
                <TD className="text-right">
                  <RemoveMember membershipId={member.membershipId} name={member.name} />
                </TD>
              </TR>
            ))}
          </TBody>
        </Table>
      </Card>
      <Card>
        <CardHeader title="Open invitations" />
        <Table caption="Open invitations" hideCaption>
          <THead>
            <TR>
              <TH>E-mail</TH>
              <TH>Role</TH>
              <TH>Expires</TH>
              <TH>
                <span className="sr-only">Actions</span>
              </TH>
            </TR>
          </THead>
          <TBody>
            {pending.length === 0 ? <EmptyRow colSpan={4}>No invitations are waiting.</EmptyRow> : null}
            {pending.map((invitation) => (
              <TR key={invitation.id}>
                <TD>{invitation.email}</TD>
                <TD>{ROLE_LABELS[invitation.role]}</TD>
                <TD className="text-ink-soft">{dateFormat.format(invitation.expiresAt)}</TD>
                <TD className="text-right">
                  <RevokeInvitation invitationId={invitation.id} email={invitation.email} />
                </TD>
              </TR>
            ))}
          </TBody>
        </Table>
      </Card>
    </div>
  );
}
