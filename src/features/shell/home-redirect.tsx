import { Redirect } from 'expo-router';
import { sectionsFor } from '@shared/auth/roles';
import { useUser } from '@/lib/session';

/** After sign-in a member starts in the first section their role may use. */
export function HomeRedirect() {
  const user = useUser();
  return <Redirect href={`/${sectionsFor(user.role)[0]}`} />;
}
