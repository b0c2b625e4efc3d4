import { ActivityIndicator } from 'react-native';
import { Banner, Button, colors } from '@/components/ui';
import { isApiRequestError } from '@/lib/api/client';

type QueryLike = { isPending: boolean; isError: boolean; error: Error | null; refetch: () => unknown };

/** Loading and failure of one query, said the same way on every designs screen; null once it has data. */
export function QueryStatus({ query, what, testID }: { query: QueryLike; what: string; testID?: string }) {
  if (query.isError && isApiRequestError(query.error) && query.error.status === 404) {
    return (
      <Banner tone="error" title={`${what} was not found`} testID={testID}>
        {query.error.message}
      </Banner>
    );
  }
  if (query.isError) {
    return (
      <Banner
        tone="error"
        title={`${what} could not be loaded`}
        testID={testID}
        action={<Button label="Try again" variant="secondary" size="compact" onPress={() => void query.refetch()} />}
      >
        {query.error?.message ?? 'Something went wrong.'}
      </Banner>
    );
  }
  if (query.isPending) return <ActivityIndicator color={colors.primary} accessibilityLabel={`Loading ${what.toLowerCase()}`} />;
  return null;
}
