// Presentations: the designer's bodies and answers, and what the client's page receives.
import { z } from 'zod';
import type { SceneFinish } from '../finishes/scene-finish';
import { pieceSchema } from './option';
import { clientModelSchema } from './piece-model';
import { roomShellSchema } from './room';
import { emailSchema } from './studio';
import { noteText } from './common';

/** A new link stays open this many days unless the designer picks another expiry. */
export const DEFAULT_EXPIRY_DAYS = 30;
/** The longest expiry one step sets (at creation or one extension). */
export const MAX_EXPIRY_DAYS = 90;
/**
 * The token's own expiry: the latest any link can work, however often it is extended. Extending
 * moves the stored expiry, not the token, so the client's link stays the same.
 */
export const LINK_LIFETIME_DAYS = 365;
/** Keys 1–9 pick an option on the client's page, so a room shows at most nine. */
export const MAX_OPTIONS_PER_ROOM = 9;
export const MAX_ROOMS_PER_PRESENTATION = 30;
export const MAX_COMMENT_LENGTH = 1000;

export const presentationStateSchema = z.enum(['active', 'expired', 'withdrawn']);
export type PresentationState = z.infer<typeof presentationStateSchema>;

const days = z
  .number({ message: 'Enter a number of days.' })
  .int('Enter whole days.')
  .min(1, 'At least 1 day.')
  .max(MAX_EXPIRY_DAYS, `At most ${MAX_EXPIRY_DAYS} days at a time.`);

const presentedRoomSchema = z.object({
  roomId: z.uuid({ message: 'Not a valid room id.' }),
  optionIds: z
    .array(z.uuid({ message: 'Not a valid option id.' }))
    .min(1, 'Pick at least one option for this room.')
    .max(MAX_OPTIONS_PER_ROOM, `Show at most ${MAX_OPTIONS_PER_ROOM} options per room.`)
    .refine((ids) => new Set(ids).size === ids.length, 'Each option once.'),
});

/** Rooms and options in the order the client will see them. */
export const createPresentationSchema = z.object({
  rooms: z
    .array(presentedRoomSchema)
    .min(1, 'Pick at least one room.')
    .max(MAX_ROOMS_PER_PRESENTATION, `Show at most ${MAX_ROOMS_PER_PRESENTATION} rooms.`)
    .refine((rooms) => new Set(rooms.map((r) => r.roomId)).size === rooms.length, 'Each room once.'),
  message: noteText(4000, 'Keep the message under 4000 characters.').default(''),
  showPrices: z.boolean().default(false),
  expiresInDays: days.default(DEFAULT_EXPIRY_DAYS),
});
export type CreatePresentationBody = z.input<typeof createPresentationSchema>;

export const sendPresentationSchema = z.object({
  // The project's client's e-mail when left out.
  to: emailSchema.optional(),
});
export type SendPresentationBody = z.input<typeof sendPresentationSchema>;

export const extendPresentationSchema = z.object({ days });
export type ExtendPresentationBody = z.input<typeof extendPresentationSchema>;

export const decideProjectSchema = z.object({ presentationId: z.uuid({ message: 'Not a valid presentation id.' }) });
export type DecideProjectBody = z.input<typeof decideProjectSchema>;

export const choiceBodySchema = z.object({
  optionId: z.uuid({ message: 'Pick one of the options.' }),
  comment: noteText(MAX_COMMENT_LENGTH, `Keep the comment under ${MAX_COMMENT_LENGTH} characters.`).default(''),
});
export type ChoiceBody = z.input<typeof choiceBodySchema>;

export const viewBodySchema = z.object({ optionId: z.uuid({ message: 'Pick one of the options.' }) });
export type ViewBody = z.input<typeof viewBodySchema>;

export const choiceSchema = z.object({
  optionId: z.string(),
  comment: z.string(),
  chosenAt: z.string(),
});
export type Choice = z.infer<typeof choiceSchema>;

// ---- What the designer sees -------------------------------------------------------------

export const presentationSummarySchema = z.object({
  id: z.string(),
  state: presentationStateSchema,
  message: z.string(),
  showPrices: z.boolean(),
  createdAt: z.string(),
  createdBy: z.string().nullable(),
  expiresAt: z.string(),
  /** The furthest the expiry can be moved: the token's own expiry. */
  latestExpiry: z.string(),
  withdrawnAt: z.string().nullable(),
  decidedAt: z.string().nullable(),
  sentAt: z.string().nullable(),
  sentTo: z.string().nullable(),
  firstOpenedAt: z.string().nullable(),
  lastOpenedAt: z.string().nullable(),
  openCount: z.number().int(),
  /** Only for owners and designers: the link is a key to the client's page. */
  link: z.string().nullable(),
  rooms: z.array(
    z.object({
      roomId: z.string(),
      name: z.string(),
      options: z.array(
        z.object({
          optionId: z.string(),
          /** As the client sees it: "Option A · name", lettered in the presentation's order. */
          label: z.string(),
          viewCount: z.number().int(),
          lastViewedAt: z.string().nullable(),
          /** The option was saved since the link was made: the client's page marks it as changed. */
          changedSinceSent: z.boolean(),
        }),
      ),
      choice: choiceSchema.nullable(),
    }),
  ),
  /** Every room has a choice and the link was not withdrawn: "Mark as decided" may use it. */
  complete: z.boolean(),
});
export type PresentationSummary = z.infer<typeof presentationSummarySchema>;

// ---- What the client's page receives -----------------------------------------------------

/** A piece as the client sees it: no supplier link, no ids of other records, a price only when shown. */
export const clientPieceSchema = pieceSchema
  .omit({
    supplierUrl: true,
    finishId: true,
    accentFinishId: true,
    price: true,
    modelId: true,
    modelFitted: true,
    modelWearsFinishes: true,
  })
  .extend({
    /** The piece's model, when it wears a ready one; else the form is drawn. */
    model: clientModelSchema.optional(),
    price: z.number().nullable().optional(),
    finish: z.object({ name: z.string(), colourHex: z.string().nullable() }).nullable(),
  });
export type ClientPiece = z.infer<typeof clientPieceSchema>;

// Built by the server from the studio's finishes, never parsed from a client: the type is enough.
const sceneFinishSchema = z.custom<SceneFinish>();

/**
 * What an option's surfaces wear in 3D: paints as colours, photo finishes as textures (the large
 * size, served through the link's own file route) with their real repeat size. Pieces by piece id.
 */
export const clientSurfacesSchema = z.object({
  floor: sceneFinishSchema.nullable(),
  ceiling: sceneFinishSchema.nullable(),
  walls: sceneFinishSchema.nullable(),
  wallOverrides: z.record(z.string(), sceneFinishSchema),
  pieces: z.record(z.string(), sceneFinishSchema),
  /** The second finish of pieces (legs, frame, handles), by piece id. */
  pieceAccents: z.record(z.string(), sceneFinishSchema).optional(),
});
export type ClientSurfaces = z.infer<typeof clientSurfacesSchema>;

export const clientOptionSchema = z.object({
  id: z.string(),
  label: z.string(),
  name: z.string(),
  note: z.string(),
  pieces: z.array(clientPieceSchema),
  surfaces: clientSurfacesSchema,
  /** The option's version now; the client's page remembers the one it last showed. */
  version: z.number().int(),
  /** Its version when the link was made (null for a link older than this record). */
  sentVersion: z.number().int().nullable(),
});
export type ClientOption = z.infer<typeof clientOptionSchema>;

export const clientRoomSchema = z.object({
  id: z.string(),
  name: z.string(),
  shell: roomShellSchema,
  options: z.array(clientOptionSchema),
  choice: choiceSchema.nullable(),
});
export type ClientRoom = z.infer<typeof clientRoomSchema>;

export const clientPresentationSchema = z.object({
  studioName: z.string(),
  projectName: z.string(),
  message: z.string(),
  showPrices: z.boolean(),
  expiresAt: z.string(),
  /** The designer has confirmed the choices: they can no longer be changed here. */
  decided: z.boolean(),
  /** The studio's currency (ISO 4217) and locale (BCP 47) for the prices shown. */
  currency: z.string(),
  locale: z.string(),
  rooms: z.array(clientRoomSchema),
});
export type ClientPresentation = z.infer<typeof clientPresentationSchema>;

export const choiceAnswerSchema = z.object({ choice: choiceSchema, changed: z.boolean() });
export type ChoiceAnswer = z.infer<typeof choiceAnswerSchema>;
