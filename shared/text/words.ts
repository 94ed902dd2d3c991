/**
 * The few word forms the product's sentences build from counts and kinds, in one place so that no message reads
 * "1 poles" or "a input".
 */

/** The word for n things. Example: plural(1, "pole") === "pole"; plural(2, "branch", "branches") === "branches". */
export const plural = (n: number, one: string, many = `${one}s`): string => (n === 1 ? one : many);

/** n with its word. Example: counted(1, "pole") === "1 pole"; counted(0, "problem") === "0 problems". */
export const counted = (n: number, one: string, many?: string): string => `${n} ${plural(n, one, many)}`;

/** The noun with its indefinite article, chosen by its first letter. Example: withArticle("input") === "an input". */
export const withArticle = (noun: string): string => `${/^[aeiou]/i.test(noun) ? "an" : "a"} ${noun}`;

/** The text with its first letter upper-case. Example: capital("wire w1") === "Wire w1". */
export const capital = (text: string): string => text.charAt(0).toUpperCase() + text.slice(1);
