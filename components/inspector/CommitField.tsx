import { useEffect, useRef, useState } from 'react';
import type { TextInput, TextInputProps } from 'react-native';
import type { z } from 'zod';
import { TextField } from '@/components/ui';
import { parseField } from '@/lib/editor/fields';

type CommitFieldProps<T> = {
  label: string;
  /** The document's value as text. */
  value: string;
  schema: z.ZodType<T>;
  /** Runs the command; returns the refusal's sentence, or null when it ran. */
  onCommit: (value: T) => string | null;
  hint?: string;
  /** A finding about this field, shown under it while the typed value is fine. */
  note?: string | null;
  /** What is wrong with a value that is still accepted (the analysis will report it), shown while typing. */
  advise?: (text: string) => string | null;
  testID?: string;
  readOnly?: boolean;
  placeholder?: string;
  keyboardType?: TextInputProps['keyboardType'];
};

/**
 * A field that edits the document: the typed text is checked as it changes (inline error), and
 * committed — one command, one undo step — on Enter or when the field loses focus, only if it is
 * valid and different. When the document changes underneath (undo, redo), the field follows
 * unless the designer is typing in it.
 */
export function CommitField<T>({ label, value, schema, onCommit, hint, note, advise, testID, readOnly, placeholder, keyboardType }: CommitFieldProps<T>) {
  const [draft, setDraft] = useState(value);
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  const ref = useRef<TextInput>(null);

  useEffect(() => {
    if (!focused.current) {
      setDraft(value);
      setError(null);
    }
  }, [value]);

  const commit = () => {
    if (draft === value) {
      setError(null);
      return;
    }
    const parsed = parseField(schema, draft);
    if (!parsed.ok) {
      setError(parsed.message);
      return;
    }
    const refusal = onCommit(parsed.value);
    setError(refusal);
  };

  return (
    <TextField
      ref={ref}
      label={label}
      hint={hint}
      value={draft}
      editable={!readOnly}
      placeholder={placeholder}
      keyboardType={keyboardType}
      autoCapitalize="none"
      autoCorrect={false}
      testID={testID}
      error={error ?? (draft === value ? (note ?? null) : (advise?.(draft) ?? null))}
      onFocus={() => {
        focused.current = true;
      }}
      onBlur={() => {
        focused.current = false;
        commit();
      }}
      onChangeText={(text) => {
        setDraft(text);
        const parsed = parseField(schema, text);
        setError(parsed.ok ? null : parsed.message);
      }}
      onSubmitEditing={commit}
      returnKeyType="done"
    />
  );
}
