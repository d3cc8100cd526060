#pragma once
/// Error types and invariant checks shared by every veer library (the bottom of the link chain).
#include <sstream>
#include <stdexcept>
#include <string>

namespace veer {

/// Bad user input: the message names the file (and line where known), the key or value found and
/// what is allowed. `main` prints it as one line and exits non-zero.
class InputError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

/// A failed internal invariant (a bug, or a numerical state the code cannot continue from).
class InternalError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

namespace detail {
[[noreturn]] inline void verify_failed(const char* cond, const std::string& msg, const char* file,
                                       int line) {
    std::ostringstream out;
    out << file << ":" << line << ": check '" << cond << "' failed: " << msg;
    throw InternalError(out.str());
}
}  // namespace detail

}  // namespace veer

/// Always-on invariant check; throws veer::InternalError with the message.
#define VEER_VERIFY(cond, msg)                                                        \
    do {                                                                              \
        if (!(cond)) ::veer::detail::verify_failed(#cond, (msg), __FILE__, __LINE__); \
    } while (0)

/// Debug-only invariant check.
#ifdef NDEBUG
#define VEER_ASSERT(cond, msg) ((void)0)
#else
#define VEER_ASSERT(cond, msg) VEER_VERIFY(cond, msg)
#endif
