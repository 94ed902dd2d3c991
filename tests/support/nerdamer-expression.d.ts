// The package's typings leave out Expression's numerator and denominator (the add-on files need none:
// importing one only registers functions with the parser, and tsc does not check side-effect imports).
import "nerdamer";

declare module "nerdamer" {
  interface Expression {
    numerator(): Expression;
    denominator(): Expression;
  }
}
