/**
 * The OpenAPI document: configuration, schemas and names of the contract, bounds, problem
 * answers, examples, security, operation ids and tag order.
 */
package utdigit.web.openapi;
