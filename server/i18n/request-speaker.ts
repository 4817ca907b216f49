import type { Request, RequestHandler } from 'express';
import { LANGUAGES, type FormatSettings, type Language } from '../../shared/format/studio-format';
import { speaker, type Speaker } from '../../shared/i18n/speak';

/**
 * Who an answer speaks to: the signed-in person in their own language, else their studio's, with the studio's
 * units and time zone; before sign-in, the language the browser asks for (Accept-Language), English by default.
 * The studio is read only when an answer needs it (an error), never on the way in.
 */
export function requestSpeaker(studioOf: (studioId: number) => Promise<Pick<FormatSettings, 'language' | 'unitSystem' | 'currency' | 'timeZone'>>) {
  return async (req: Request): Promise<Speaker> => {
    const user = req.user;
    if (!user) return speaker({ language: (req.acceptsLanguages(...LANGUAGES) || 'en') as Language });
    if (user.language === 'en') return speaker({ language: 'en' });
    const studio = await studioOf(user.studioId);
    return speaker({ ...studio, language: user.language ?? studio.language });
  };
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** Who this request's answer speaks to (see {@link requestSpeaker}); read only when an answer has words to say. */
      speaker?: () => Promise<Speaker>;
    }
  }
}

/** Lets a route say its own sentences (a log's warnings) in the person's language: `await req.speaker?.()`. */
export function attachSpeaker(speakerOf: (req: Request) => Promise<Speaker>): RequestHandler {
  return (req, _res, next) => {
    req.speaker = () => speakerOf(req);
    next();
  };
}
