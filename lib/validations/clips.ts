import { z } from "zod";

import { CLIP_TYPES, MAX_CLIP_BYTES, MAX_PARTS, type ClipType } from "@/lib/uploads/plan";

export const IMAGE_TYPES = { "image/jpeg": "jpg", "image/png": "png" } as const;
export const MAX_IMAGE_BYTES = 5 * 1024 * 1024;
/** Longest camera run we accept as a start footage, in feet. */
export const MAX_FOOTAGE_FT = 2000;

// Letters the browser never puts in a file name: path separators and control characters (NUL included).
const UNSAFE_NAME = /[\u0000-\u001f\u007f/\\]/;

export const clipFileNameSchema = z
  .string()
  .min(1, "The file needs a name.")
  .max(255, "Keep the file name under 256 characters.")
  .refine(
    (name) => !UNSAFE_NAME.test(name) && name !== "." && name !== "..",
    "The file name may not contain slashes, '..' paths or control characters.",
  );

const footage = z.number().min(0, "Footage starts at 0 ft.").max(MAX_FOOTAGE_FT, `Keep the footage under ${MAX_FOOTAGE_FT} ft.`);

export const startClipSchema = z.object({
  fileName: clipFileNameSchema,
  sizeBytes: z
    .number()
    .int("The size is a whole number of bytes.")
    .min(1, "The file is empty.")
    .max(MAX_CLIP_BYTES, `Clips are limited to ${MAX_CLIP_BYTES / 1024 ** 3} GiB.`),
  contentType: z.enum(Object.keys(CLIP_TYPES) as [ClipType, ...ClipType[]], { message: "Upload an MP4, QuickTime (.mov) or WebM video." }),
  startFootage: footage.nullish(),
});
export type StartClipInput = z.infer<typeof startClipSchema>;

const partNumber = z.coerce.number().int().min(1, "Part numbers start at 1.").max(MAX_PARTS, `Part numbers stop at ${MAX_PARTS}.`);

export const partsQuerySchema = z
  .object({ from: partNumber.optional(), to: partNumber.optional() })
  .refine((q) => q.from === undefined || q.to === undefined || q.from <= q.to, { message: "from must not be after to.", path: ["to"] });

export const completeClipSchema = z.object({
  parts: z
    .array(
      z.object({
        partNumber: z.number().int().min(1, "Part numbers start at 1.").max(MAX_PARTS, `Part numbers stop at ${MAX_PARTS}.`),
        etag: z.string().min(1).max(200),
      }),
    )
    .min(1, "List the parts you uploaded.")
    .max(MAX_PARTS),
});
export type CompleteClipInput = z.infer<typeof completeClipSchema>;

export const patchClipSchema = z.object({ startFootage: footage.nullable() });

const imageUpload = {
  contentType: z.enum(["image/jpeg", "image/png"], { message: "Use a JPEG or PNG image." }),
  sizeBytes: z.number().int().min(1, "The image is empty.").max(MAX_IMAGE_BYTES, "Keep the image under 5 MB."),
};

export const posterUploadSchema = z.object(imageUpload);
export const posterCompleteSchema = z.object({ key: z.string().min(1).max(300) });

export const stillUploadSchema = z.object({
  ...imageUpload,
  clipId: z.uuid("Not a valid clip id.").optional(),
  second: z
    .number()
    .min(0)
    .max(24 * 3600)
    .optional(),
});
export type StillUploadInput = z.infer<typeof stillUploadSchema>;

export const clipIdParams = z.object({ clipId: z.uuid("Not a valid id.") });
export const stillIdParams = z.object({ stillId: z.uuid("Not a valid id.") });
