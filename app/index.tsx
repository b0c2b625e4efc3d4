import { Redirect } from 'expo-router';

/** The app's front door: Designs, where the signed-in layout sends signed-out visitors on to sign-in. */
export default function Index() {
  return <Redirect href="/designs" />;
}
