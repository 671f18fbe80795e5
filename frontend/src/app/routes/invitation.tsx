import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useLocation, useNavigate, useParams } from 'react-router-dom';
import { AuthCard } from '@/components/layouts/auth-card';
import { paths } from '@/config/paths';
import { InvitationCard } from '@/features/classes/components/invitation-card';
import { useAuth } from '@/lib/auth-store';

export default function InvitationRoute() {
  const { token = '' } = useParams();
  const auth = useAuth();
  const navigate = useNavigate();
  const location = useLocation();
  const here = location.pathname;
  const isStudent = auth.status === 'signed-in' && auth.user.role === 'student';
  return (
    <AuthCard title="You are invited to a class">
      <InvitationCard
        token={token}
        canAccept={isStudent}
        onAccepted={() => navigate(paths.student.assignments.getHref())}
        signInAction={({ email }) =>
          auth.status === 'signed-in' ? (
            <Typography>Invitations are for student accounts; you are signed in as a {auth.user.role}.</Typography>
          ) : (
            <Stack direction="row" spacing={1}>
              <Button variant="contained" component={RouterLink} to={paths.auth.register.getHref(here, email)}>
                Create a student account
              </Button>
              <Button variant="outlined" component={RouterLink} to={paths.auth.signIn.getHref(here)}>
                Sign in
              </Button>
            </Stack>
          )
        }
      />
    </AuthCard>
  );
}
