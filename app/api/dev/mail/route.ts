import { readCapturedMail } from "@/app/_server/captured-mail";
import { route } from "@/app/_server/respond";
import { AppError } from "@/db/errors";

export const dynamic = "force-dynamic";

/** The mail the local fake caught, newest first. 404 unless the fake is in use (BACKPLATE_MAIL_FAKE_DIR). */
export const GET = route(async () => {
  const mail = readCapturedMail();
  if (!mail) throw new AppError("not_found", "Captured mail is only shown while the local mail fake is in use.");
  return Response.json({ mail });
});
