import { pitchBesideName, pitchText } from "./format";

type PitchStop = { footage: string | number; ranks?: number; family: string; name?: string };

/**
 * A stop's pitch typeset as the trade writes it: 8′, 2⅔′, a mixture's ranks IV. Beside a name that
 * already carries the ranks ("Mixture IV"), the footage instead, so the ranks are not said twice.
 */
export function Pitch({ stop, className = "" }: { stop: PitchStop; className?: string }) {
  const text = stop.name === undefined ? pitchText(stop) : pitchBesideName({ ...stop, name: stop.name });
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
