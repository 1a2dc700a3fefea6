/** Coverage of an encoded or sector scan: the amplitude a reflector loses between scan positions. */
package utdigit.core.coverage;
