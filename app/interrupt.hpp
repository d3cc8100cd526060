#pragma once
/// Ctrl-C (SIGINT) and SIGTERM as a flag the run loop polls between steps, so the state written to
/// the checkpoint is always a whole step.
namespace veer {

/// Installs the handlers; a second Ctrl-C restores the default action (stops at once).
void install_interrupt_handlers();
/// True once an interrupt has arrived.
bool interrupt_requested();

}  // namespace veer
