import { useState, type ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { useFonts } from 'expo-font';
import { Inter_400Regular } from '@expo-google-fonts/inter/400Regular';
import { Inter_600SemiBold } from '@expo-google-fonts/inter/600SemiBold';
import { Inter_700Bold } from '@expo-google-fonts/inter/700Bold';
import { StatusBar } from 'expo-status-bar';
import { SessionLoading } from '@/components/shell/SessionStates';
import { createQueryClient } from '@/lib/query-client';

/**
 * Everything the routes need around them: safe areas, the query client and the three Inter weights
 * the type scale uses (shipped in the bundle, never fetched from a font service).
 */
export function AppProviders({ children }: { children: ReactNode }) {
  const [queryClient] = useState(createQueryClient);
  const [fontsLoaded, fontError] = useFonts({ Inter_400Regular, Inter_600SemiBold, Inter_700Bold });
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <StatusBar style="dark" />
        {/* A font that fails to load is not worth a blank app: fall back to the system face. */}
        {fontsLoaded || fontError ? children : <SessionLoading />}
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
