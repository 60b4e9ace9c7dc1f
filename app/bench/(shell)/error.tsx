"use client";

export { AreaError as default } from "@/components/area-error";
