import { z } from "zod";

export const signUpSchema = z.object({
  name: z.string().trim().min(2, "Enter your full name.").max(120, "Keep the name under 120 characters."),
  email: z.string().trim().toLowerCase().email("Enter an e-mail address like name@example.com.").max(320),
  password: z
    .string()
    .min(10, "Use at least 10 characters.")
    .max(200, "Keep the password under 200 characters."),
  role: z.enum(["agent", "inspector", "buyer"], { message: "Choose how you will use Gradeline." }),
  company: z.string().trim().max(120).optional(),
});

export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: z.string().trim().email("Enter the e-mail address you signed up with."),
  password: z.string().min(1, "Enter your password."),
});

export type SignInInput = z.infer<typeof signInSchema>;
