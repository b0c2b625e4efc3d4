import { z } from 'zod';

/**
 * CHAP secrets of a design (api.md): `POST /api/designs/:id/secrets` makes them (admins, designers),
 * `GET /api/designs/:id/secrets` shows them (admins, installers; each showing recorded),
 * `GET /api/designs/:id/secrets/status` says whether they exist and who saw them, without a secret.
 */
export const SECRET_MIN_LENGTH = 16;
export const SECRET_MAX_LENGTH = 128;

/** `length`: characters per secret; 16 (96 bits, RFC 7143 §9.2.1's minimum without IPsec) unless asked for more. */
export const generateSecretsBody = z
  .object({ length: z.number().int().min(SECRET_MIN_LENGTH, `Use at least ${SECRET_MIN_LENGTH} characters (96 bits)`).max(SECRET_MAX_LENGTH).optional() })
  .strict();
export type GenerateSecretsBody = z.infer<typeof generateSecretsBody>;

/** `host`: show one host's secrets only (its id in the design). */
export const revealQuery = z.object({ host: z.string().min(1).max(200).optional() }).strict();

export type SecretDirection = 'initiator' | 'target';

export type RevealedSecret = { host: string; name: string; direction: SecretDirection; secret: string };
export type RevealResponse = { secrets: RevealedSecret[]; generatedAt: string | null; notice: string };

export type GenerateResponse = {
  generated: { hosts: number; secrets: number; length: number; mode: 'one-way' | 'mutual'; at: string; version: number };
  notice: string;
};

export type SecretsStatus = {
  /** The CHAP mode of the design's latest version. */
  mode: 'none' | 'one-way' | 'mutual';
  generatedAt: string | null;
  generatedBy: { id: number; name: string } | null;
  length: number | null;
  hosts: { host: string; name: string; directions: SecretDirection[] }[];
  reveals: { by: { id: number; name: string }; at: string; host: string | null; count: number }[];
};
export type SecretsStatusResponse = { status: SecretsStatus };
