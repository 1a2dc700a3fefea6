/**
 * Reading JSON strictly: the mapper and its scalar rules, contract names (camelCase to
 * snake_case), JSON Pointers to fields, the texts of read failures.
 */
package utdigit.web.json;
