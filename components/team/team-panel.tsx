"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button, FormError, TextField } from "@/components/ui/field";
import { ROLES, type Role } from "@/lib/auth/roles";
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from "@/lib/auth/permissions";
import { api, ApiError } from "@/lib/client/api";

interface TeamData {
  members: { membershipId: number; userId: number; name: string; email: string; role: Role; since: string }[];
  invitations: { invitationId: number; name: string; email: string; role: Role; expiresAt: string }[];
}

const TEAM_KEY = ["team"];

export function TeamPanel({ canManage, currentUserId }: { canManage: boolean; currentUserId: number }) {
  const queryClient = useQueryClient();
  const team = useQuery({ queryKey: TEAM_KEY, queryFn: () => api<TeamData>("/api/team") });
  const [actionError, setActionError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);

  const refresh = () => queryClient.invalidateQueries({ queryKey: TEAM_KEY });
  const onError = (e: Error) => setActionError(e.message);

  const changeRole = useMutation({
    mutationFn: ({ membershipId, role }: { membershipId: number; role: Role }) =>
      api(`/api/team/members/${membershipId}`, { method: "PATCH", body: { role } }),
    onSuccess: () => {
      setActionError(null);
      setNotice("Role changed.");
      void refresh();
    },
    onError,
  });
  const remove = useMutation({
    mutationFn: (membershipId: number) => api(`/api/team/members/${membershipId}`, { method: "DELETE" }),
    onSuccess: () => {
      setActionError(null);
      setNotice("Member removed.");
      void refresh();
    },
    onError,
  });
  const withdraw = useMutation({
    mutationFn: (invitationId: number) => api(`/api/team/invitations/${invitationId}`, { method: "DELETE" }),
    onSuccess: () => void refresh(),
    onError,
  });

  if (team.isPending) return <p className="text-zinc-500">Loading the team…</p>;
  if (team.isError) return <FormError message={team.error.message} />;

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
      <section aria-labelledby="members-heading">
        <h2 id="members-heading" className="mb-2 text-sm font-semibold">
          Members
        </h2>
        <FormError message={actionError} testId="team-error" />
        {notice && !actionError ? (
          <p role="status" className="mb-2 text-xs text-accent-700">
            {notice}
          </p>
        ) : null}
        <table
          className="w-full border-collapse overflow-hidden rounded border border-zinc-200 bg-white"
          data-testid="members-table"
        >
          <thead className="bg-zinc-100 text-left text-xs text-zinc-600">
            <tr>
              <th className="px-3 py-2 font-medium">Name</th>
              <th className="px-3 py-2 font-medium">E-mail</th>
              <th className="px-3 py-2 font-medium">Role</th>
              {canManage ? <th className="px-3 py-2 font-medium">Action</th> : null}
            </tr>
          </thead>
          <tbody>
            {team.data.members.map((m) => (
              <tr key={m.membershipId} className="border-t border-zinc-200" data-testid={`member-${m.email}`}>
                <td className="px-3 py-2">{m.name}</td>
                <td className="px-3 py-2 text-zinc-600">{m.email}</td>
                <td className="px-3 py-2">
                  {canManage ? (
                    <select
                      aria-label={`Role of ${m.name}`}
                      value={m.role}
                      onChange={(e) =>
                        changeRole.mutate({ membershipId: m.membershipId, role: e.target.value as Role })
                      }
                      className="rounded border border-zinc-300 bg-white px-2 py-1"
                    >
                      {ROLES.map((r) => (
                        <option key={r} value={r}>
                          {ROLE_LABELS[r]}
                        </option>
                      ))}
                    </select>
                  ) : (
                    <span data-testid="member-role">{ROLE_LABELS[m.role]}</span>
                  )}
                </td>
                {canManage ? (
                  <td className="px-3 py-2">
                    {m.userId === currentUserId ? (
                      <span className="text-xs text-zinc-500">You</span>
                    ) : (
                      <Button
                        variant="danger"
                        className="px-2 py-1 text-xs"
                        onClick={() => {
                          if (
                            window.confirm(
                              `Remove ${m.name} from this account? Their work stays in the history.`,
                            )
                          )
                            remove.mutate(m.membershipId);
                        }}
                      >
                        Remove
                      </Button>
                    )}
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>

        {team.data.invitations.length > 0 ? (
          <>
            <h2 className="mb-2 mt-6 text-sm font-semibold">Invitations waiting</h2>
            <ul
              className="divide-y divide-zinc-200 rounded border border-zinc-200 bg-white"
              data-testid="invitations-list"
            >
              {team.data.invitations.map((i) => (
                <li key={i.invitationId} className="flex items-center justify-between px-3 py-2">
                  <span>
                    {i.name} <span className="text-zinc-500">({i.email})</span> · {ROLE_LABELS[i.role]}
                    <span className="ml-2 text-xs text-zinc-500">
                      expires {new Date(i.expiresAt).toLocaleDateString()}
                    </span>
                  </span>
                  {canManage ? (
                    <Button
                      variant="secondary"
                      className="px-2 py-1 text-xs"
                      onClick={() => withdraw.mutate(i.invitationId)}
                    >
                      Withdraw
                    </Button>
                  ) : null}
                </li>
              ))}
            </ul>
          </>
        ) : null}
      </section>
      <aside>
        {canManage ? (
          <InviteForm
            onInvited={() => {
              setNotice("Invitation sent.");
              void refresh();
            }}
          />
        ) : null}
        <h2 className="mb-2 mt-4 text-sm font-semibold">Roles</h2>
        <dl className="space-y-1.5 text-xs text-zinc-600">
          {ROLES.map((r) => (
            <div key={r}>
              <dt className="inline font-medium text-zinc-800">{ROLE_LABELS[r]}: </dt>
              <dd className="inline">{ROLE_DESCRIPTIONS[r]}</dd>
            </div>
          ))}
        </dl>
      </aside>
    </div>
  );
}

function InviteForm({ onInvited }: { onInvited: () => void }) {
  const [email, setEmail] = useState("");
  const [name, setName] = useState("");
  const [role, setRole] = useState<Role>("designer");
  const [error, setError] = useState<ApiError | null>(null);
  const invite = useMutation({
    mutationFn: () => api("/api/team/invitations", { method: "POST", body: { email, name, role } }),
    onSuccess: () => {
      setEmail("");
      setName("");
      setError(null);
      onInvited();
    },
    onError: (e: ApiError) => setError(e),
  });
  const fieldError = (field: string) => error?.fieldErrors.find((f) => f.field === field)?.message;

  return (
    <form
      className="rounded border border-zinc-200 bg-white p-4"
      onSubmit={(e) => {
        e.preventDefault();
        invite.mutate();
      }}
      noValidate
      data-testid="invite-form"
    >
      <h2 className="mb-3 text-sm font-semibold">Invite a member</h2>
      <FormError
        message={error && error.fieldErrors.length === 0 ? error.message : null}
        testId="invite-error"
      />
      <TextField label="Name" name="invite-name" value={name} onChange={setName} error={fieldError("name")} />
      <TextField
        label="E-mail"
        name="invite-email"
        type="email"
        value={email}
        onChange={setEmail}
        error={fieldError("email")}
      />
      <div className="mb-3">
        <label htmlFor="invite-role" className="mb-1 block text-xs font-medium text-zinc-700">
          Role
        </label>
        <select
          id="invite-role"
          value={role}
          onChange={(e) => setRole(e.target.value as Role)}
          className="w-full rounded border border-zinc-300 bg-white px-2 py-1.5"
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      </div>
      <Button type="submit" disabled={invite.isPending} className="w-full">
        {invite.isPending ? "Sending…" : "Send invitation"}
      </Button>
    </form>
  );
}
