/**
 * Unit forms of the inputs and answers (mm/in, m/s, in/us) and the velocity inputs with where
 * a velocity came from.
 */
package utdigit.web.units;
