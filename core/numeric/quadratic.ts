/**
 * The larger real root of a x^2 + b x + c = 0 (a > 0), in the form that does
 * not lose digits when b^2 is much larger than 4ac: q = -(b + sgn(b) sqrt(b^2 - 4ac))/2,
 * roots q/a and c/q (Press et al., Numerical Recipes, 3rd ed., section 5.6).
 * NaN when the roots are not real (the square root of a negative discriminant is NaN).
 */
export function largerRoot(a: number, b: number, c: number): number {
  const q = -0.5 * (b + (Math.sign(b) || 1) * Math.sqrt(b * b - 4 * a * c));
  return Math.max(q / a, c / q);
}
