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
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import type { UserRole } from '@/lib/auth-store';
import { useUpdateUserRole } from '../api/update-user-role';
import { useUsers } from '../api/get-users';

const roles: UserRole[] = ['student', 'teacher', 'admin'];

/** Every account, filterable by name or address, with its role to change. */
export function UserTable({ currentUserId }: { currentUserId?: string }) {
  const users = useUsers();
  const updateRole = useUpdateUserRole();
  const [filter, setFilter] = useState('');
  const shown = useMemo(() => {
    const needle = filter.trim().toLowerCase();
    return (users.data ?? []).filter(
      (user) => !needle || user.displayName.toLowerCase().includes(needle) || user.email.includes(needle),
    );
  }, [users.data, filter]);

  if (users.isPending) return <Loading label="Loading accounts…" />;
  if (users.isError) return <ErrorAlert error={users.error} onRetry={() => users.refetch()} />;
  return (
    <>
      <TextField label="Find by name or e-mail" size="small" value={filter} onChange={(e) => setFilter(e.target.value)} sx={{ mb: 2, minWidth: 300 }} />
      {updateRole.isError && <ErrorAlert error={updateRole.error} />}
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
                      onChange={(event) => updateRole.mutate({ id: user.id, role: event.target.value as UserRole })}
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
    </>
  );
}
