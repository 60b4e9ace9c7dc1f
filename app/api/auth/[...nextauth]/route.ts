// next-auth's own endpoints; sign-in attempts are counted per account and per address first.
import NextAuth from "next-auth";
import type { NextRequest } from "next/server";

import { authOptions, clientAddress } from "@/lib/auth/options";
import { consumeSignInAttempt } from "@/lib/auth/rate-limit";
import { errorResponse, toErrorResponse } from "@/lib/api/route";
import { AppError } from "@/lib/errors";

type Ctx = { params: Promise<{ nextauth: string[] }> };

const handler = (req: NextRequest, ctx: Ctx) => NextAuth(req, ctx, authOptions());

export const GET = handler;

export async function POST(req: NextRequest, ctx: Ctx) {
  const { nextauth } = await ctx.params;
  if (nextauth[0] === "callback" && nextauth[1] === "credentials") {
    try {
      const form = await req.clone().formData();
      const email = String(form.get("email") ?? "");
      await consumeSignInAttempt(email, clientAddress(Object.fromEntries(req.headers)));
    } catch (error) {
      if (error instanceof AppError) return errorResponse(error);
      return toErrorResponse(error);
    }
  }
  return handler(req, ctx);
}
