/**
 * Root of the app: ships the IBM Plex fonts from the npm font packages (one sub-path import per weight used, so
 * the export carries only those files), and provides react-query, gestures and safe-area insets to every route.
 */
import { IBMPlexMono_400Regular } from '@expo-google-fonts/ibm-plex-mono/400Regular';
import { IBMPlexMono_500Medium } from '@expo-google-fonts/ibm-plex-mono/500Medium';
import { IBMPlexSans_400Regular } from '@expo-google-fonts/ibm-plex-sans/400Regular';
import { IBMPlexSans_500Medium } from '@expo-google-fonts/ibm-plex-sans/500Medium';
import { IBMPlexSans_600SemiBold } from '@expo-google-fonts/ibm-plex-sans/600SemiBold';
import { useFonts } from 'expo-font';
import { AppProviders, FontsLoading } from '@/components/shell/app-providers';
import { Slot } from 'expo-router';

export default function RootLayout() {
  const [loaded, error] = useFonts({
    IBMPlexSans_400Regular,
    IBMPlexSans_500Medium,
    IBMPlexSans_600SemiBold,
    IBMPlexMono_400Regular,
    IBMPlexMono_500Medium,
  });
  // A font that fails to load must not lock the user out: fall back to the system face.
  if (!loaded && !error) return <FontsLoading />;
  return (
    <AppProviders>
      <Slot />
    </AppProviders>
  );
}
