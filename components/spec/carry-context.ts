"use client";
import { createContext } from "react";
import type { Carried } from "./keyboard-carry";

/** The stop or division being carried by the keyboard, for its card's highlight; null otherwise. */
export const CarryContext = createContext<Carried | null>(null);
