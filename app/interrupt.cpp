#include "app/interrupt.hpp"

#include <atomic>
#include <csignal>

namespace veer {
namespace {
volatile std::sig_atomic_t g_interrupted = 0;

extern "C" void on_interrupt(int signal) {
    g_interrupted = 1;
    std::signal(signal, SIG_DFL);  // a second one ends the process at once
}
}  // namespace

void install_interrupt_handlers() {
    std::signal(SIGINT, on_interrupt);
    std::signal(SIGTERM, on_interrupt);
    std::signal(SIGHUP, on_interrupt);  // a closed terminal or ssh session: keep the work too
}

bool interrupt_requested() { return g_interrupted != 0; }

}  // namespace veer
