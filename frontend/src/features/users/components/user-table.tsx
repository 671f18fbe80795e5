import Alert from '@mui/material/Alert';
import DialogContentText from '@mui/material/DialogContentText';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import { useMemo, useState } from 'react';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import type { SessionUser, UserRole } from '@/lib/auth-store';
import { errorMessage } from '@/lib/error-words';
import { useUpdateUserRole } from '../api/update-user-role';
import { useUsers } from '../api/get-users';
import { roleChangeEffects, roleWithArticle } from './role-change';

const roles: UserRole[] = ['student', 'teacher', 'admin'];

/**
 * Every account, filterable by name or address, with its role to change. A change asks first,
 * naming the person, the old and new role and what changes for them; until confirmed (and on
 * cancel) the select keeps showing the role the server has.
 */
export function UserTable({ currentUserId }: { currentUserId?: string }) {
  const users = useUsers();
  const updateRole = useUpdateUserRole();
  const [filter, setFilter] = useState('');
  const [asking, setAsking] = useState<{ user: SessionUser; role: UserRole }>();
  const [changed, setChanged] = useState<string>();
  const shown = useMemo(() => {
    const needle = filter.trim().toLowerCase();
    return (users.data ?? []).filter(
      (user) =>
        !needle || user.displayName.toLowerCase().includes(needle) || user.email.includes(needle),
    );
  }, [users.data, filter]);

  if (users.isPending) return <Loading label="Loading accounts…" />;
  if (users.isError) return <ErrorAlert error={users.error} onRetry={() => users.refetch()} />;
  return (
    <>
      <TextField
        label="Find by name or e-mail"
        size="small"
        value={filter}
        onChange={(e) => setFilter(e.target.value)}
        sx={{ mb: 2, minWidth: 300 }}
      />
      {changed && (
        <Alert
          severity="success"
          role="status"
          sx={{ mb: 2 }}
          onClose={() => setChanged(undefined)}
        >
          {changed}
        </Alert>
      )}
      {shown.length === 0 ? (
        <EmptyState title="No accounts match" />
      ) : (
        <TableContainer component={Paper}>
          <Table size="small" aria-label="Accounts">
            <TableHead>
              <TableRow>
                <TableCell>Name</TableCell>
                <TableCell>E-mail</TableCell>
                <TableCell>Since</TableCell>
                <TableCell>Role</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {shown.map((user) => (
                <TableRow key={user.id}>
                  <TableCell>{user.displayName}</TableCell>
                  <TableCell>{user.email}</TableCell>
                  <TableCell>{new Date(user.createdAt).toLocaleDateString()}</TableCell>
                  <TableCell>
                    <TextField
                      select
                      size="small"
                      label={`Role of ${user.displayName}`}
                      value={user.role}
                      disabled={user.id === currentUserId || updateRole.isPending}
                      onChange={(event) => {
                        const role = event.target.value as UserRole;
                        if (role === user.role) return;
                        updateRole.reset();
                        setChanged(undefined);
                        setAsking({ user, role });
                      }}
                      sx={{ minWidth: 150 }}
                    >
                      {roles.map((role) => (
                        <MenuItem key={role} value={role}>
                          {role}
                        </MenuItem>
                      ))}
                    </TextField>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}
      {asking && (
        <ConfirmDialog
          open
          title={`Make ${asking.user.displayName} ${roleWithArticle(asking.role)}?`}
          confirmLabel={`Make them ${roleWithArticle(asking.role)}`}
          cancelLabel={`Keep them ${roleWithArticle(asking.user.role)}`}
          busy={updateRole.isPending}
          onConfirm={() =>
            updateRole.mutate(
              { id: asking.user.id, role: asking.role },
              {
                onSuccess: (saved) => {
                  setAsking(undefined);
                  setChanged(`${saved.displayName} is now ${roleWithArticle(saved.role)}.`);
                },
              },
            )
          }
          onCancel={() => {
            setAsking(undefined);
            updateRole.reset();
          }}
        >
          <DialogContentText>
            <strong>{asking.user.displayName}</strong> ({asking.user.email}) is{' '}
            {roleWithArticle(asking.user.role)} now and would become {roleWithArticle(asking.role)}.
          </DialogContentText>
          {roleChangeEffects(asking.user.role, asking.role).map((line) => (
            <DialogContentText key={line} sx={{ mt: 1.5 }}>
              {line}
            </DialogContentText>
          ))}
          {updateRole.isError && (
            <Alert severity="error" sx={{ mt: 2 }}>
              {errorMessage(updateRole.error)}
            </Alert>
          )}
        </ConfirmDialog>
      )}
    </>
  );
}
