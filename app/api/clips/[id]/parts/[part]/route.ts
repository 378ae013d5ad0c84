import { recordPartSchema } from "@/lib/clips/schema";
import * as uploads from "@/lib/uploads/service";
import { AppError } from "@/lib/errors";
import { idParam, param, route } from "@/lib/http/route";

// PUT /api/clips/:id/parts/:part — record a part the store accepted (its ETag); repeating it is harmless.
export const PUT = route({ signedIn: true, body: recordPartSchema }, async ({ actor, params, body }) => {
  const part = Number(param(params, "part"));
  if (!Number.isInteger(part) || part < 1) throw new AppError("not_found", "No such part.");
  return uploads.recordPart(actor, idParam(params, "id", "clip"), part, body);
});
