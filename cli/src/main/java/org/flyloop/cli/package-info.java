/**
 * The {@code flyloop} command-line entry point ({@link org.flyloop.cli.Main}), its exit codes
 * ({@link org.flyloop.cli.ExitCodes}) and the single place where exceptions become messages.
 */
package org.flyloop.cli;
