import { z } from 'zod';
import { singleLineText } from '../text/plain-text.js';

/** Kinds of machine in the equipment register. */
export const machineKinds = ['crane', 'conveyor', 'mill-auxiliary', 'winch', 'other'] as const;
export const machineKindSchema = z.enum(machineKinds);
export type MachineKind = z.infer<typeof machineKindSchema>;

/** Motions a brake position can serve. */
export const motions = [
  'hoist',
  'auxiliary-hoist',
  'trolley',
  'bridge',
  'travel',
  'conveyor',
  'slew',
  'other',
] as const;
export const motionSchema = z.enum(motions);
export type Motion = z.infer<typeof motionSchema>;

const tag = z
  .string()
  .trim()
  .min(1, 'required')
  .max(40)
  .regex(/^[A-Za-z0-9][A-Za-z0-9._/-]*$/, 'letters, digits, . _ / - only');

export const createSiteSchema = z
  .object({
    code: z
      .string()
      .trim()
      .toUpperCase()
      .regex(/^[A-Z0-9]{2,6}$/, '2 to 6 capital letters or digits'),
    name: singleLineText({ min: 2, max: 120 }),
  })
  .strict();
export type CreateSiteInput = z.infer<typeof createSiteSchema>;

export const createMachineSchema = z
  .object({
    siteId: z.string().uuid(),
    tag,
    name: singleLineText({ min: 2, max: 120 }),
    kind: machineKindSchema,
  })
  .strict();
export type CreateMachineInput = z.infer<typeof createMachineSchema>;

/** Free text in the plant's own words (brake kind, thruster, lining); empty when not known. */
const plantWords = singleLineText({ max: 200 }).default('');

export const createPositionSchema = z
  .object({
    machineId: z.string().uuid(),
    tag,
    description: singleLineText({ min: 2, max: 200 }),
    motion: motionSchema,
    brakeKind: plantWords,
    thruster: plantWords,
    lining: plantWords,
  })
  .strict();
export type CreatePositionInput = z.infer<typeof createPositionSchema>;

/** PATCH /api/register/sites/:id — the code is part of every document number and stays. */
export const updateSiteSchema = z.object({ name: singleLineText({ min: 2, max: 120 }) }).strict();
export type UpdateSiteInput = z.infer<typeof updateSiteSchema>;

/** PATCH /api/register/machines/:id */
export const updateMachineSchema = z
  .object({
    tag: tag.optional(),
    name: singleLineText({ min: 2, max: 120 }).optional(),
    kind: machineKindSchema.optional(),
  })
  .strict();
export type UpdateMachineInput = z.infer<typeof updateMachineSchema>;

/** PATCH /api/register/positions/:id */
export const updatePositionSchema = z
  .object({
    tag: tag.optional(),
    description: singleLineText({ min: 2, max: 200 }).optional(),
    motion: motionSchema.optional(),
    brakeKind: singleLineText({ max: 200 }).optional(),
    thruster: singleLineText({ max: 200 }).optional(),
    lining: singleLineText({ max: 200 }).optional(),
  })
  .strict();
export type UpdatePositionInput = z.infer<typeof updatePositionSchema>;

export const currentApprovedSchema = z.object({
  sheetId: z.string().uuid(),
  documentNumber: z.string(),
  revisionId: z.string().uuid(),
  revisionLabel: z.string(),
});

/** A sheet of a position that is not approved yet: a draft, in check or returned. */
export const openSheetSchema = z.object({
  sheetId: z.string().uuid(),
  documentNumber: z.string(),
  sheetType: z.string(),
  revisionLabel: z.string(),
  state: z.string(),
});
export type OpenSheet = z.infer<typeof openSheetSchema>;

export const positionSchema = z.object({
  id: z.string().uuid(),
  tag: z.string(),
  description: z.string(),
  motion: motionSchema,
  brakeKind: z.string(),
  thruster: z.string(),
  lining: z.string(),
  /** The approved revision currently in force for this position (latest approved sheet), if any. */
  currentApproved: currentApprovedSchema.nullable(),
  /** The approved revision in force per sheet type (a brake sheet and a disc-spring sheet both). */
  inForce: z.array(currentApprovedSchema.extend({ sheetType: z.string() })),
  /** Sheets of this position whose latest revision is not approved. */
  openSheets: z.array(openSheetSchema),
});
export type Position = z.infer<typeof positionSchema>;

export const machineSchema = z.object({
  id: z.string().uuid(),
  tag: z.string(),
  name: z.string(),
  kind: machineKindSchema,
  positions: z.array(positionSchema),
});
export type Machine = z.infer<typeof machineSchema>;

export const siteSchema = z.object({
  id: z.string().uuid(),
  code: z.string(),
  name: z.string(),
  machines: z.array(machineSchema),
});
export type Site = z.infer<typeof siteSchema>;

/** GET /api/register */
export const registerSchema = z.object({ sites: z.array(siteSchema) });
export type Register = z.infer<typeof registerSchema>;

/** Answers of the three POST /api/register/* routes. */
export const createdSiteSchema = siteSchema.omit({ machines: true });
export const createdMachineSchema = machineSchema
  .omit({ positions: true })
  .extend({ siteId: z.string().uuid() });
export const createdPositionSchema = positionSchema
  .omit({ currentApproved: true, inForce: true, openSheets: true })
  .extend({ machineId: z.string().uuid() });
