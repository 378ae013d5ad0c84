import { route } from "@/lib/http/route";
import { getMyNotificationSettings, notificationSettingsSchema, updateMyNotificationSettings } from "@/lib/notifications/service";

// GET /api/account/notifications — the caller's own notices, which are on, which are essential
export const GET = route({ signedIn: true }, async ({ actor }) => ({ settings: await getMyNotificationSettings(actor) }));

// PUT /api/account/notifications — switch the caller's optional notices off (listed) or on
export const PUT = route({ signedIn: true, body: notificationSettingsSchema }, async ({ actor, body }) => ({
  settings: await updateMyNotificationSettings(actor, body),
}));
