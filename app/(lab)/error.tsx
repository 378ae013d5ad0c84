"use client";

// Errors inside the lab pages keep the navigation; the panel is the same as the root one.
export { default } from "../error";
