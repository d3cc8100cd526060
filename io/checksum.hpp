#pragma once
/// The checksum of a checkpoint dataset's values: 64-bit FNV-1a (Fowler, Noll and Vo; the offset
/// basis and prime of the published FNV specification) over the values as the file stores them.
/// Each step h = (h xor byte) * prime is a bijection of h, so any change of a single byte changes
/// the result.
#include <cstdint>
#include <cstring>
#include <string>
#include <type_traits>
#include <utility>
#include <vector>

namespace veer::hdf5 {

/// A running 64-bit FNV-1a hash.
class Fnv1a {
public:
    void add(const void* data, std::size_t size) {
        const auto* bytes = static_cast<const unsigned char*>(data);
        for (std::size_t k = 0; k < size; ++k) m_hash = (m_hash ^ bytes[k]) * 1099511628211ULL;
    }
    std::int64_t value() const {
        std::int64_t v;
        std::memcpy(&v, &m_hash, sizeof v);  // stored as a signed 64-bit attribute
        return v;
    }

private:
    std::uint64_t m_hash = 14695981039346656037ULL;
};

template <class T>
std::int64_t hash_of(const std::vector<T>& values) {
    static_assert(std::is_arithmetic_v<T>);
    Fnv1a h;
    for (const T& v : values) {
        unsigned char le[sizeof(T)];  // little-endian, as the file stores it
        std::memcpy(le, &v, sizeof(T));
        if constexpr (__BYTE_ORDER__ == __ORDER_BIG_ENDIAN__)
            for (std::size_t a = 0, b = sizeof(T) - 1; a < b; ++a, --b) std::swap(le[a], le[b]);
        h.add(le, sizeof(T));
    }
    return h.value();
}

inline std::int64_t hash_of(const std::vector<std::string>& values) {
    Fnv1a h;
    for (const std::string& s : values) {
        const std::uint64_t n = s.size();
        h.add(&n, sizeof n);
        h.add(s.data(), s.size());
    }
    return h.value();
}

}  // namespace veer::hdf5
