import { IBMPlexMono_400Regular } from '@expo-google-fonts/ibm-plex-mono/400Regular';
import { IBMPlexSans_400Regular } from '@expo-google-fonts/ibm-plex-sans/400Regular';
import { IBMPlexSans_500Medium } from '@expo-google-fonts/ibm-plex-sans/500Medium';
import { IBMPlexSans_700Bold } from '@expo-google-fonts/ibm-plex-sans/700Bold';
import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import Head from 'expo-router/head';
import { useState } from 'react';
import { View } from 'react-native';
import { createQueryClient } from '../client/create-query-client';
import { installMarksFont } from '../client/install-marks-font';
import { theme } from '../constants/theme';

installMarksFont();

export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  // The fonts ship inside the app (IBM Plex from @expo-google-fonts); only these four files are exported.
  const [fontsLoaded, fontError] = useFonts({
    IBMPlexSans_400Regular,
    IBMPlexSans_500Medium,
    IBMPlexSans_700Bold,
    IBMPlexMono_400Regular,
  });
  if (!fontsLoaded && !fontError) return <View style={{ flex: 1, backgroundColor: theme.color.paper }} />;
  return (
    // Head's titles need its provider above every screen: without it, expo-router's Head (react-helmet-async) has no context on the web.
    <Head.Provider>
      <QueryClientProvider client={queryClient}>
        <Slot />
      </QueryClientProvider>
    </Head.Provider>
  );
}
