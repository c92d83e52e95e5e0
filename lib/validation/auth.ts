import { z } from "zod";
import { accountPasswordProblem, newPasswordSchema } from "./password";
import { plainText } from "./text";

export const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .max(254, "That e-mail address is too long.")
  .pipe(z.email("Enter a valid e-mail address."));

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password.").max(1024, "That password is too long."),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z
  .object({
    name: plainText("Enter your name.")
      .min(1, "Enter your name.")
      .max(100, "Use at most 100 characters."),
    email: emailSchema,
    password: newPasswordSchema,
  })
  .superRefine((v, ctx) => {
    const problem = accountPasswordProblem(v.password, v);
    if (problem) ctx.addIssue({ code: "custom", path: ["password"], message: problem });
  });
export type SignUpInput = z.infer<typeof signUpSchema>;

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, "Enter your current password.").max(1024),
  newPassword: newPasswordSchema,
});
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

export const requestResetSchema = z.object({ email: emailSchema });
export type RequestResetInput = z.infer<typeof requestResetSchema>;

export const confirmResetSchema = z.object({
  token: z
    .string()
    .min(20, "This reset link is not valid.")
    .max(200, "This reset link is not valid."),
  newPassword: newPasswordSchema,
});
export type ConfirmResetInput = z.infer<typeof confirmResetSchema>;
