/** An angle written as a rational multiple of π: "pi", "-pi/2", "3pi/4", "0.5*pi" (sign, multiplier, divisor). */
export const PI_MULTIPLE = /^([+-]?)(\d+(?:\.\d+)?)?\s*\*?\s*pi(?:\s*\/\s*(\d+))?$/i;
