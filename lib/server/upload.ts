/**
 * Reading an uploaded file in a route handler: either the raw body (text/csv, application/json,
 * text/plain) or multipart/form-data with a `file` field. Size-limited before the text is used:
 * 413 `too_large` with the limit in the message.
 */
import "server-only";
import { HttpError, badRequest } from "./http";

function tooLarge(maxBytes: number): HttpError {
  return new HttpError(413, "too_large", `The file is larger than ${Math.round(maxBytes / 1024)} kB; split it or trim it.`, { limitBytes: maxBytes });
}

export async function readUploadText(req: Request, maxBytes: number): Promise<string> {
  const declared = Number(req.headers.get("content-length") ?? "NaN");
  // multipart adds a few hundred bytes of framing around the file
  const slack = 16 * 1024;
  if (Number.isFinite(declared) && declared > maxBytes + slack) throw tooLarge(maxBytes);
  const type = (req.headers.get("content-type") ?? "").toLowerCase();
  if (type.startsWith("multipart/form-data")) {
    let form: FormData;
    try {
      form = await req.formData();
    } catch {
      throw badRequest("The upload is not valid multipart form data.");
    }
    const file = form.get("file");
    if (file === null) throw badRequest('The upload has no "file" field.', [{ path: "file", message: "choose a file" }]);
    if (typeof file === "string") {
      if (new TextEncoder().encode(file).length > maxBytes) throw tooLarge(maxBytes);
      return file;
    }
    if (file.size > maxBytes) throw tooLarge(maxBytes);
    return await file.text();
  }
  const text = await req.text();
  if (new TextEncoder().encode(text).length > maxBytes) throw tooLarge(maxBytes);
  return text;
}
