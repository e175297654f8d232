/**
 * Physical constants and units.
 *
 * <p>Everything inside stellabar is CGS: centimetres, grams, seconds, kelvin, erg, dyn. The
 * constants are the CODATA 2018 recommended values (exact SI-defining constants where the 2019
 * SI made them exact) and the IAU 2015 Resolution B3 nominal solar values, each named with its
 * source. {@link org.stellabar.physics.Units} converts user input such as {@code "40 Msun"} or
 * {@code "2 kg/m3"} to CGS at the edge of the program; nothing below the command line deals in
 * any other unit.
 *
 * <p><b>API and internal.</b> The types of this package that {@link org.stellabar.api} lists are
 * part of the API; the others are internal and may change between versions.
 */
package org.stellabar.physics;
