/**
 * Zero stored as a double: −0. A class field that will hold non-integers starts with it rather than the integer
 * literal 0, so that the JavaScript engine gives the field a double representation from the start and does not
 * change the object's hidden class — deoptimising the row loops that use it — when the first non-integer is stored.
 * −0 equals 0 in every comparison and sum; no field that starts with it is divided by before it is set.
 */
export const DOUBLE_ZERO = -0;
