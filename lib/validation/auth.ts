import * as v from "valibot";

export const emailSchema = v.pipe(
  v.string("e-mail is required"),
  v.trim(),
  v.toLowerCase(),
  v.minLength(1, "e-mail is required"),
  v.maxLength(254, "e-mail is too long"),
  v.email("enter a valid e-mail address"),
);

export const signInSchema = v.object({
  email: emailSchema,
  password: v.pipe(v.string("password is required"), v.minLength(1, "password is required"), v.maxLength(200, "password is too long")),
});

export const passwordSchema = v.pipe(
  v.string("password is required"),
  v.minLength(10, "use at least 10 characters"),
  v.maxLength(200, "password is too long"),
);
