// The member list of a team as a Blueprint Table; owners get a role select and a remove button per row.
import { Button, HTMLSelect } from '@blueprintjs/core';
import { Cell, Column, Table } from '@blueprintjs/table';
import { TEAM_ROLES, type Member, type TeamRole } from '@hexloom/contracts';
import { formatDate } from '../utils/formatDate.js';

export type MembersTableProps = {
  members: readonly Member[];
  /** True for owners: roles become selects and each row can be removed. */
  canManage: boolean;
  /** The member whose change is in flight (its controls are disabled). */
  busyUserId?: string | undefined;
  onChangeRole: (userId: string, role: TeamRole) => void;
  onRemove: (member: Member) => void;
};

const ROW_HEIGHT_PX = 36;
const HEADER_HEIGHT_PX = 31;

/** Name, login, e-mail, role, joined; plus actions for owners. Container has data-testid="members-table". */
export function MembersTable({ members, canManage, busyUserId, onChangeRole, onRemove }: MembersTableProps) {
  const at = (row: number): Member | undefined => members[row];
  const text = (value: (m: Member) => string, mono = false) => (row: number) => {
    const member = at(row);
    return <Cell className={mono ? 'hx-mono' : undefined}>{member ? value(member) : ''}</Cell>;
  };
  const roleCell = (row: number) => {
    const member = at(row);
    if (!member) return <Cell />;
    if (!canManage) return <Cell className="hx-role">{member.role}</Cell>;
    return (
      <Cell interactive>
        <HTMLSelect
          minimal
          fill
          aria-label={`Role of ${member.login}`}
          data-testid={`role-select-${member.login}`}
          value={member.role}
          disabled={busyUserId === member.userId}
          onChange={(event) => onChangeRole(member.userId, event.currentTarget.value as TeamRole)}
          className="hx-role"
          options={TEAM_ROLES}
        />
      </Cell>
    );
  };
  const actionCell = (row: number) => {
    const member = at(row);
    if (!member) return <Cell />;
    return (
      <Cell interactive>
        <Button
          size="small"
          variant="minimal"
          intent="danger"
          icon="remove"
          text="Remove"
          aria-label={`Remove ${member.login}`}
          data-testid={`remove-member-${member.login}`}
          disabled={busyUserId === member.userId}
          onClick={() => onRemove(member)}
        />
      </Cell>
    );
  };

  const columns = [
    <Column key="name" name="Name" cellRenderer={text((m) => m.name)} />,
    <Column key="login" name="Login" cellRenderer={text((m) => m.login, true)} />,
    <Column key="email" name="E-mail" cellRenderer={text((m) => m.email ?? '—')} />,
    <Column key="role" name="Role" cellRenderer={roleCell} />,
    <Column key="joined" name="Joined" cellRenderer={text((m) => formatDate(m.joinedAt), true)} />,
  ];
  if (canManage) columns.push(<Column key="actions" name="" cellRenderer={actionCell} />);
  const widths = canManage ? [210, 130, 290, 150, 140, 128] : [240, 150, 330, 160, 168];

  return (
    <div
      className="hx-members-table"
      data-testid="members-table"
      style={{ height: HEADER_HEIGHT_PX + ROW_HEIGHT_PX * Math.max(members.length, 1) + 2 }}
    >
      <Table
        numRows={members.length}
        enableRowHeader={false}
        enableFocusedCell={false}
        defaultRowHeight={ROW_HEIGHT_PX}
        columnWidths={widths}
        cellRendererDependencies={[members, canManage, busyUserId]}
      >
        {columns}
      </Table>
    </div>
  );
}
