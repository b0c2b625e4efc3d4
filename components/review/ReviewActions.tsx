import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, TextField, space } from '@/components/ui';
import { useReviewAction } from '@/lib/api/reviews';
import { commentProblem, overrideSentence, type ReviewOptions } from '@/lib/designs/review-rules';
import { describeFailure } from '@/lib/forms';
import type { ReviewAction } from '@/shared/api/designs';

function commentHint(options: ReviewOptions): string {
  if (options.submit) return 'Optional: a note for the reviewer';
  return options.overrideErrors ? 'Needed to ask for changes, and to approve despite the errors' : 'Needed when you ask for changes';
}

type ReviewActionsProps = { designId: number; number: number; options: ReviewOptions };

/** The comment field and the steps this person may take on this version. */
export function ReviewActions({ designId, number, options }: ReviewActionsProps) {
  const review = useReviewAction(designId, number);
  const [comment, setComment] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [pending, setPending] = useState<ReviewAction | null>(null);
  const failure = describeFailure(review.error);

  function act(action: ReviewAction) {
    const missing = commentProblem(action, comment, options.overrideErrors);
    setProblem(missing);
    if (missing) return;
    setPending(action);
    const trimmed = comment.trim();
    review.mutate({ action, ...(trimmed ? { comment: trimmed } : {}) }, { onSuccess: () => setComment(''), onSettled: () => setPending(null) });
  }

  return (
    <View style={styles.wrap} testID="review-actions">
      {options.overrideErrors ? (
        <Banner tone="warning" title="Errors in this version" testID="review-override-warning">
          {overrideSentence(options.overrideErrors)}
        </Banner>
      ) : null}
      <TextField
        label="Comment"
        hint={commentHint(options)}
        value={comment}
        onChangeText={setComment}
        multiline
        numberOfLines={3}
        error={problem ?? failure.fields.comment}
        testID="review-comment"
      />
      {failure.form ? (
        <Banner tone="error" title="That step was not recorded" testID="review-error">
          {failure.form}
        </Banner>
      ) : null}
      <View style={styles.buttons}>
        {options.submit ? (
          <Button label="Submit for review" loading={pending === 'submit'} loadingLabel="Submitting…" disabled={review.isPending} onPress={() => act('submit')} testID="review-submit" />
        ) : null}
        {options.decide ? (
          <>
            <Button label="Approve" loading={pending === 'approve'} loadingLabel="Approving…" disabled={review.isPending} onPress={() => act('approve')} testID="review-approve" />
            <Button
              label="Ask for changes"
              variant="secondary"
              loading={pending === 'request-changes'}
              loadingLabel="Sending back…"
              disabled={review.isPending}
              onPress={() => act('request-changes')}
              testID="review-request-changes"
            />
          </>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
