/**
 * One class per subcommand, plus the option groups they share as picocli mixins
 * ({@link org.flyloop.cli.command.SpecFileOptions}, {@link org.flyloop.cli.command.OperatingPointOptions}).
 * Commands load the spec, call the models, and hand the results to {@code org.flyloop.cli.output};
 * they hold no physics.
 */
package org.flyloop.cli.command;
