import type { ErrorCode } from '../shared/types/api';
import { english, render, translate, type Said, type Speaker } from '../shared/i18n/speak';

/** What an error says to a person: the sentence and, for a form, one per field. */
export interface Spoken {
  message: string;
  fields?: Record<string, string>;
}

const say = (text: string | Said) => (typeof text === 'string' ? text : english(text));

/**
 * An error with a stable snake_case code the client switches on. `message` and `fields` are the English
 * answer; {@link AppError.speak} gives it in the person's language (sentences written as keys, or found by
 * their English wording in the server's dictionary, `server/i18n/messages.ts`).
 */
export class AppError extends Error {
  public readonly fields?: Record<string, string>;
  private readonly said?: { message: string | Said; fields?: Record<string, string | Said> };

  constructor(
    public readonly status: number,
    public readonly code: ErrorCode,
    message: string | Said,
    fields?: Record<string, string | Said>,
    /** Words of its own in another language, for an error the dictionary cannot say (a refused form). */
    private readonly localize?: (who: Speaker) => Spoken,
  ) {
    super(say(message));
    if (fields) this.fields = Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, say(v)]));
    this.said = { message, fields };
  }

  /** The answer in the speaker's language: English byte for byte as `message` and `fields`; other languages word by word, English where no words are known. */
  speak(who: Speaker): Spoken {
    if (who.language === 'en') return { message: this.message, ...(this.fields ? { fields: this.fields } : {}) };
    if (this.localize) return this.localize(who);
    const inLanguage = (text: string | Said) => (typeof text === 'string' ? (translate(text, who) ?? text) : render(text, who));
    const fields = this.said?.fields;
    return {
      message: inLanguage(this.said?.message ?? this.message),
      ...(fields ? { fields: Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, inLanguage(v)])) } : {}),
    };
  }
}

export const badRequest = (message: string | Said, fields?: Record<string, string | Said>) =>
  new AppError(400, 'validation', message, fields);
export const unauthenticated = (message = 'Sign in first') => new AppError(401, 'unauthenticated', message);
/** A refused sign-in that says more than the bare refusal (a warning before a lock), with its fields. */
export const refusedSignIn = (message: Said, fields?: Record<string, string | Said>) => new AppError(401, 'unauthenticated', message, fields);
export const forbidden = (message = 'Your role cannot do this') => new AppError(403, 'forbidden', message);
export const notFound = (what = 'Record') => new AppError(404, 'not_found', `${what} not found`);
export const conflict = (message: string | Said, fields?: Record<string, string | Said>) =>
  new AppError(409, 'conflict', message, fields);
