import { describe, expect, it } from "vitest";
import { AppError, toResponse, validationError } from "@/lib/errors";
import { inviteInputSchema, userUpdateSchema } from "@/lib/users/schema";
import { inviteMail } from "@/lib/users/invite-mail";

describe("inviteInputSchema", () => {
  it("normalises the e-mail and removes duplicate roles", () => {
    const v = inviteInputSchema.parse({ email: "  Ana@Example.TEST ", name: " Ana ", roles: ["reviewer", "reviewer"] });
    expect(v).toMatchObject({ email: "ana@example.test", name: "Ana", roles: ["reviewer"] });
  });

  it("explains each bad field in words", () => {
    const r = inviteInputSchema.safeParse({ email: "nope", name: "x".repeat(121), roles: ["owner"] });
    expect(r.success).toBe(false);
    const fields = validationError(r.error!).fields!;
    expect(fields.email).toBe("Enter a valid e-mail address.");
    expect(fields.name).toBe("Name must be at most 120 characters.");
    expect(fields["roles.0"]).toBe("Unknown role.");
  });

  it("refuses markup in a name", () => {
    const r = inviteInputSchema.safeParse({ email: "a@b.test", name: "<script>alert(1)</script>", roles: ["lead"] });
    expect(r.error?.issues[0].message).toBe("Name cannot contain < or >.");
  });

  it("says which fields are missing", () => {
    const fields = validationError(inviteInputSchema.safeParse({}).error!).fields!;
    expect(Object.keys(fields).sort()).toEqual(["email", "name", "roles"]);
  });
});

describe("userUpdateSchema", () => {
  it("refuses an empty change", () => {
    expect(userUpdateSchema.safeParse({}).error?.issues[0].message).toMatch(/Nothing to change/);
  });
});

describe("toResponse", () => {
  it("maps AppError to its status with the one error shape", async () => {
    const res = toResponse(new AppError("conflict", "Already there."), "req-1");
    expect(res.status).toBe(409);
    expect(await res.json()).toEqual({ error: { code: "conflict", message: "Already there.", requestId: "req-1" } });
  });

  it("hides unknown errors behind a 500 with the request id and no stack", async () => {
    const original = console.error;
    console.error = () => {};
    const res = toResponse(new Error("secret detail at /srv/x.ts:10"), "req-2");
    console.error = original;
    const body = await res.json();
    expect(res.status).toBe(500);
    expect(JSON.stringify(body)).not.toMatch(/secret|x\.ts/);
    expect(body.error.message).toMatch(/req-2/);
  });
});

describe("inviteMail", () => {
  it("carries the link and the expiry, and escapes names in HTML", () => {
    const m = inviteMail({ to: "a@b.test", name: "A & B", invitedBy: "Lead", link: "http://x.test/invite/abc", expiresAt: new Date("2026-12-04T10:00:00Z") });
    expect(m.text).toContain("http://x.test/invite/abc");
    expect(m.text).toContain("2026-12-04 10:00 UTC");
    expect(m.html).toContain("A &#38; B");
  });
});
