import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ROLE_LABELS } from '@shared/auth/roles';
import type { Member } from '@shared/api/types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { type Column, Table } from '@/components/ui/table';
import { Text } from '@/components/ui/text';
import { InviteForm } from '@/features/members/components/invite-form';
import { MemberEditor } from '@/features/members/components/member-editor';
import { PendingInvites } from '@/features/members/components/pending-invites';
import { useMembers } from '@/hooks/use-members';
import { useUser } from '@/lib/session';
import { space, useBreakpoints } from '@/lib/theme';

export function MembersScreen() {
  const user = useUser();
  const { isDesk } = useBreakpoints();
  const members = useMembers();
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const selected = members.data?.members.find((m) => m.id === selectedId) ?? null;
  const toggle = (id: string) => setSelectedId((current) => (current === id ? null : id));

  const manageButton = (member: Member) => (
    <Button
      testID={`manage-${member.email}`}
      label="Manage"
      ariaLabel={`Manage ${member.name}`}
      selected={member.id === selectedId}
      onPress={() => toggle(member.id)}
    />
  );

  const columns: Column<Member>[] = [
    { title: 'Name', flex: 1.3, render: (m) => <NameCell member={m} isSelf={m.id === user.id} /> },
    { title: 'E-mail', flex: 1.7, render: (m) => <Text>{m.email}</Text> },
    { title: 'Role', flex: 1.1, render: (m) => <Text>{ROLE_LABELS[m.role]}</Text> },
    { title: 'Status', flex: 1, render: (m) => <StatusBadge active={m.active} /> },
    { title: 'Actions', flex: 0.8, render: manageButton },
  ];

  return (
    <Screen testID="members-screen" title="Members" subtitle={`Who works in ${user.shopName}, and what each may do.`}>
      {members.error ? (
        <ErrorState title="Couldn't load the members" error={members.error} onRetry={() => void members.mutate()} />
      ) : !members.data ? (
        <LoadingState label="Loading members…" />
      ) : isDesk ? (
        <View style={styles.section}>
          <Table label="Members" testID="members-table" columns={columns} rows={members.data.members} rowKey={(m) => m.id} />
          {selected ? (
            <Card>
              <MemberEditor member={selected} isSelf={selected.id === user.id} />
            </Card>
          ) : null}
        </View>
      ) : (
        <View style={styles.section} testID="members-cards">
          {members.data.members.map((m) => (
            <Card key={m.id} testID={`member-card-${m.email}`}>
              <NameCell member={m} isSelf={m.id === user.id} />
              <Text tone="textMuted">{m.email}</Text>
              <View style={styles.badges}>
                <Badge label={ROLE_LABELS[m.role]} tone="primary" />
                <StatusBadge active={m.active} />
              </View>
              {manageButton(m)}
              {m.id === selectedId ? <MemberEditor member={m} isSelf={m.id === user.id} /> : null}
            </Card>
          ))}
        </View>
      )}
      <View style={[styles.invites, isDesk && styles.invitesDesk]}>
        <Card style={isDesk && styles.invitePane}>
          <InviteForm />
        </Card>
        <Card style={isDesk && styles.invitePane}>
          <PendingInvites />
        </Card>
      </View>
    </Screen>
  );
}

function NameCell({ member, isSelf }: { member: Member; isSelf: boolean }) {
  return (
    <View style={styles.name}>
      <Text variant="bodyStrong">{member.name}</Text>
      {isSelf ? <Badge label="You" /> : null}
    </View>
  );
}

function StatusBadge({ active }: { active: boolean }) {
  return active ? <Badge label="Active" tone="success" icon="check" /> : <Badge label="Deactivated" tone="danger" icon="lock" />;
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  name: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  invites: { gap: space.lg },
  invitesDesk: { flexDirection: 'row', alignItems: 'flex-start' },
  invitePane: { flex: 1 },
});
