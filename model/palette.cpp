#include "palette.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace pitchloop::model::palette {

namespace {

double toLinear(double c) { return c <= 0.04045 ? c / 12.92 : std::pow((c + 0.055) / 1.055, 2.4); }
double fromLinear(double c) {
    c = std::clamp(c, 0.0, 1.0);
    return c <= 0.0031308 ? 12.92 * c : 1.055 * std::pow(c, 1 / 2.4) - 0.055;
}

// sRGB (IEC 61966-2-1) primaries and D65 white.
constexpr double kXn = 0.95047, kYn = 1.0, kZn = 1.08883;

double labF(double t) {
    constexpr double d = 6.0 / 29;
    return t > d * d * d ? std::cbrt(t) : t / (3 * d * d) + 4.0 / 29;
}
double labFInverse(double t) {
    constexpr double d = 6.0 / 29;
    return t > d ? t * t * t : 3 * d * d * (t - 4.0 / 29);
}

using Matrix = std::array<std::array<double, 3>, 3>;

Rgb applyLinear(const Matrix& m, Rgb c) {
    const double r = toLinear(c.r), g = toLinear(c.g), b = toLinear(c.b);
    return {fromLinear(m[0][0] * r + m[0][1] * g + m[0][2] * b),
            fromLinear(m[1][0] * r + m[1][1] * g + m[1][2] * b),
            fromLinear(m[2][0] * r + m[2][1] * g + m[2][2] * b)};
}

int hexDigit(char c) {
    if (c >= '0' && c <= '9') return c - '0';
    if (c >= 'a' && c <= 'f') return c - 'a' + 10;
    if (c >= 'A' && c <= 'F') return c - 'A' + 10;
    return 0;
}

} // namespace

Rgb fromHex(std::string_view hex) {
    if (hex.size() != 7 || hex[0] != '#') return {};
    auto channel = [&](int k) { return (hexDigit(hex[1 + 2 * k]) * 16 + hexDigit(hex[2 + 2 * k])) / 255.0; };
    return {channel(0), channel(1), channel(2)};
}

std::string toHex(Rgb c) {
    auto byte = [](double v) { return static_cast<int>(std::lround(std::clamp(v, 0.0, 1.0) * 255)); };
    char buf[8];
    std::snprintf(buf, sizeof buf, "#%02x%02x%02x", byte(c.r), byte(c.g), byte(c.b));
    return buf;
}

Lab toLab(Rgb c) {
    const double r = toLinear(c.r), g = toLinear(c.g), b = toLinear(c.b);
    const double x = 0.4124564 * r + 0.3575761 * g + 0.1804375 * b;
    const double y = 0.2126729 * r + 0.7151522 * g + 0.0721750 * b;
    const double z = 0.0193339 * r + 0.1191920 * g + 0.9503041 * b;
    const double fx = labF(x / kXn), fy = labF(y / kYn), fz = labF(z / kZn);
    return {116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)};
}

Rgb fromLab(Lab c) {
    const double fy = (c.l + 16) / 116, fx = fy + c.a / 500, fz = fy - c.b / 200;
    const double x = kXn * labFInverse(fx), y = kYn * labFInverse(fy), z = kZn * labFInverse(fz);
    const double r = 3.2404542 * x - 1.5371385 * y - 0.4985314 * z;
    const double g = -0.9692660 * x + 1.8760108 * y + 0.0415560 * z;
    const double b = 0.0556434 * x - 0.2040259 * y + 1.0572252 * z;
    return {fromLinear(r), fromLinear(g), fromLinear(b)};
}

double deltaE(Lab x, Lab y) {
    return std::sqrt((x.l - y.l) * (x.l - y.l) + (x.a - y.a) * (x.a - y.a) + (x.b - y.b) * (x.b - y.b));
}

Rgb simulate(Rgb c, Vision v) {
    // Machado, Oliveira & Fernandes (2009), Table 1 at severity 1.0, on linear RGB.
    static constexpr Matrix kDeuteranopia{{{0.367322, 0.860646, -0.227968},
                                           {0.280085, 0.672501, 0.047413},
                                           {-0.011820, 0.042940, 0.968881}}};
    static constexpr Matrix kProtanopia{{{0.152286, 1.052583, -0.204868},
                                         {0.114503, 0.786281, 0.099216},
                                         {-0.003882, -0.048116, 1.051998}}};
    return applyLinear(v == Vision::Deuteranopia ? kDeuteranopia : kProtanopia, c);
}

const std::array<std::string_view, 9>& scaleStops() {
    static constexpr std::array<std::string_view, 9> kStops{"#440154", "#472d7b", "#3b528b", "#2c728e", "#21918c",
                                                            "#28ae80", "#5ec962", "#addc30", "#fde725"};
    return kStops;
}

Rgb scaleAt(double t) {
    const auto& stops = scaleStops();
    const double u = std::clamp(t, 0.0, 1.0) * static_cast<double>(stops.size() - 1);
    const std::size_t i = std::min(stops.size() - 2, static_cast<std::size_t>(std::floor(u)));
    const Rgb a = fromHex(stops[i]), b = fromHex(stops[i + 1]);
    const double f = u - static_cast<double>(i);
    return {a.r + (b.r - a.r) * f, a.g + (b.g - a.g) * f, a.b + (b.b - a.b) * f};
}

Rgb neutral() { return fromHex("#b4b8bf"); }

int stepsAt(int level) { return 1 << (kLevels - 1 - std::clamp(level, 0, kLevels - 1)); }

int levelOf(double spread) {
    if (!(spread < 0.8)) return 3; // NaN too
    if (spread >= 0.4) return 2;
    if (spread >= 0.2) return 1;
    return 0;
}

int stepOf(double scaled, int level) {
    const int steps = stepsAt(level);
    return std::clamp(static_cast<int>(std::floor(std::clamp(scaled, 0.0, 1.0) * steps)), 0, steps - 1);
}

Rgb colour(int level, int step) {
    level = std::clamp(level, 0, kLevels - 1);
    const int steps = stepsAt(level);
    const Lab base = toLab(scaleAt((std::clamp(step, 0, steps - 1) + 0.5) / steps));
    const Lab grey = toLab(neutral());
    const double f = static_cast<double>(level) / (kLevels - 1);
    return fromLab({base.l + (grey.l - base.l) * f, base.a + (grey.a - base.a) * f, base.b + (grey.b - base.b) * f});
}

std::string colourFor(double scaled, double spread) {
    const int level = levelOf(spread);
    return toHex(colour(level, stepOf(scaled, level)));
}

int divergingStepOf(double signedScaled, int level) {
    return stepOf((std::clamp(signedScaled, -1.0, 1.0) + 1) / 2, level);
}

Rgb divergingColour(int level, int step) {
    level = std::clamp(level, 0, kLevels - 1);
    const int steps = stepsAt(level);
    // Blue (#2166ac) to a light neutral (#f0f0ee) to orange (#d95f0e), in L*a*b*.
    const Lab low = toLab(fromHex("#2166ac")), mid = toLab(fromHex("#f0f0ee")), high = toLab(fromHex("#d95f0e"));
    const double t = (std::clamp(step, 0, steps - 1) + 0.5) / steps; // 0..1
    const Lab from = t < 0.5 ? low : mid, to = t < 0.5 ? mid : high;
    const double u = t < 0.5 ? t / 0.5 : (t - 0.5) / 0.5;
    const Lab base{from.l + (to.l - from.l) * u, from.a + (to.a - from.a) * u, from.b + (to.b - from.b) * u};
    const Lab grey = toLab(neutral());
    const double f = static_cast<double>(level) / (kLevels - 1);
    return fromLab({base.l + (grey.l - base.l) * f, base.a + (grey.a - base.a) * f, base.b + (grey.b - base.b) * f});
}

bool darkTextOn(Rgb c) { return toLab(c).l > 62; }

} // namespace pitchloop::model::palette
