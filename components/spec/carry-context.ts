"use client";
import { createContext, type PointerEvent } from "react";
import type { Carried } from "./keyboard-carry";

/** The stop or division being carried by the keyboard, for its card's highlight; null otherwise. */
export const CarryContext = createContext<Carried | null>(null);

/**
 * What a stop's grip does when pressed: the board hands the press to the one draggable dnd-kit knows
 * for stops (division-board.tsx). The value never changes, so no card draws again for it.
 */
export const StopPressContext = createContext<((e: PointerEvent<HTMLButtonElement>) => void) | null>(null);

/** The id of the board's DndContext, which is also the id of dnd-kit's hidden instructions for the grips. */
export const BOARD_ID = "scheme-board";
