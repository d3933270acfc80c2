/**
 * The standard caution of calculations that can hurt someone if they are wrong or misapplied:
 * pressure containment, relief, blowdown (depressuring) and low metal temperature. A record tagged
 * with one of these topics carries it automatically; any record can add it with `caution()`.
 */
import { InputError } from "../errors.js";

/** Topics whose records carry the standard caution. */
export type SafetyTopic = "pressure" | "relief" | "blowdown" | "low-metal-temperature";

/** Every safety topic, in a stable order. */
export const SAFETY_TOPICS: readonly SafetyTopic[] = Object.freeze([
  "pressure",
  "relief",
  "blowdown",
  "low-metal-temperature",
]);

/** How each topic is named in the caution text. */
const TOPIC_WORDS: Readonly<Record<SafetyTopic, string>> = {
  pressure: "pressure containment",
  relief: "relief sizing",
  blowdown: "blowdown and depressuring",
  "low-metal-temperature": "minimum design metal temperature",
};

/** Type guard: is this one of the safety topics? */
export function isSafetyTopic(value: unknown): value is SafetyTopic {
  return typeof value === "string" && (SAFETY_TOPICS as readonly string[]).includes(value);
}

/** Checks a list of topics, throwing an InputError that names the bad entry. */
export function checkSafetyTopics(topics: unknown, input: string): SafetyTopic[] {
  if (topics === undefined) return [];
  if (!Array.isArray(topics)) {
    throw new InputError({
      input,
      unit: "-",
      validRange: `an array of ${SAFETY_TOPICS.join(", ")}`,
      received: topics,
    });
  }
  return topics.map((t, i) => {
    if (!isSafetyTopic(t)) {
      throw new InputError({
        input: `${input}[${i}]`,
        unit: "-",
        validRange: SAFETY_TOPICS.join(", "),
        received: t,
      });
    }
    return t;
  });
}

/**
 * The standard caution paragraph. With topics, it names them; without, it speaks of process
 * calculations in general.
 * @example processSafetyCaution(["low-metal-temperature"])
 */
export function processSafetyCaution(topics: readonly SafetyTopic[] = []): string {
  const unique = SAFETY_TOPICS.filter((t) => topics.includes(t));
  const scope =
    unique.length === 0
      ? "This calculation may feed decisions on pressure containment, relief, blowdown or low metal temperature."
      : `This calculation feeds decisions on ${joinWords(unique.map((t) => TOPIC_WORDS[t]))}.`;
  return (
    `${scope} Its results come from the models, inputs and assumptions listed in this record and ` +
    "are only as good as they are; they have not been checked against plant measurements. Before " +
    "any result is used for design, operation or a safety decision, it must be checked under the " +
    "site's codes, standards and procedures (and the applicable national codes and regulations), and " +
    "reviewed and approved by a licensed or otherwise competent engineer who takes responsibility " +
    "for it. Where this record and those codes disagree, the codes govern."
  );
}

function joinWords(words: string[]): string {
  if (words.length <= 1) return words.join("");
  return `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`;
}
