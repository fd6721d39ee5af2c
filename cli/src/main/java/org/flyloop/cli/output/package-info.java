/**
 * Output formats: aligned text tables, JSON documents, and the safety notice. Formatting only;
 * every number shown was computed elsewhere.
 */
package org.flyloop.cli.output;
