import { pitchText } from "./format";

/** A stop's pitch typeset as the trade writes it: 8′, 2⅔′, a mixture's ranks IV. */
export function Pitch({ stop, className = "" }: { stop: { footage: string | number; ranks?: number; family: string }; className?: string }) {
  const text = pitchText(stop);
  const invalid = text.endsWith("?");
  return (
    <span
      className={`num whitespace-nowrap ${invalid ? "text-clash underline decoration-dotted" : ""} ${className}`}
      title={invalid ? "Not a footage the estimator can read" : undefined}
    >
      {text}
    </span>
  );
}
