#include "display.h"

#include "debrief.h"
#include "focus.h"
#include "wording.h"
#include "zonenames.h"

#include <QDate>
#include <QLocale>

#include <algorithm>
#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QString number(double v, int decimals) { return QLocale().toString(v, 'f', decimals); }
QString qs(const std::string& s) { return QString::fromStdString(s); }

/// A tidy step for an axis spanning `span`: 1, 2 or 5 times a power of ten.
double tidyStep(double span, int steps) {
    const double raw = span / std::max(steps, 1);
    const double magnitude = std::pow(10.0, std::floor(std::log10(raw)));
    for (double m : {1.0, 2.0, 5.0, 10.0})
        if (m * magnitude >= raw) return m * magnitude;
    return 10 * magnitude;
}

} // namespace

QString valueText(MetricKind kind, double value) { return qs(words::value(kind, value)); }

QString intervalText(MetricKind kind, const stats::Interval& interval) {
    return qs(words::interval(kind, interval));
}

QString levelText(double level) {
    return QStringLiteral("%1% interval").arg(number(100 * level, std::fmod(100 * level, 1) == 0 ? 0 : 1));
}

QString sampleText(MetricKind kind, const WindowSum& sum, const Window& w) {
    if (kind == MetricKind::Count) {
        if (w.kind == Window::Kind::Ewma)
            return QStringLiteral("%1 matches, weighted").arg(sum.matches);
        return sum.matches == 1 ? QStringLiteral("1 match") : QStringLiteral("%1 matches").arg(sum.matches);
    }
    if (w.kind == Window::Kind::Ewma)
        return QStringLiteral("n ≈ %1").arg(number(sum.den, 0));
    return QStringLiteral("n = %1").arg(number(sum.den, 0));
}

QString targetText(MetricKind kind, const std::optional<Target>& target) {
    if (!target) return {};
    return qs(words::target(target->direction, kind, target->value));
}

QString zoneText(int band, int lane, const ZoneGrid& grid) {
    return QString::fromStdString(words::capitalised(zoneLabel(band, lane, grid)));
}

QString verdictWord(const std::string& verdict) {
    const auto v = verdictFromString(verdict);
    if (!v) return QString::fromStdString(verdict);
    switch (*v) {
    case Verdict::Worked: return QStringLiteral("worked");
    case Verdict::Partly: return QStringLiteral("partly");
    case Verdict::NoChange: return QStringLiteral("no change");
    case Verdict::CantTell: return QStringLiteral("can't tell");
    }
    return {};
}

QString stateText(FlagState state) { return qs(words::capitalised(words::stateName(state))); }

QString singleMatchText(double matchTail) {
    if (std::isnan(matchTail)) return {};
    if (matchTail > model::kUnusualMatchTail)
        return QStringLiteral("a usual match for a team on target");
    if (matchTail <= 0) return QStringLiteral("unusual match: never if on target");
    return QStringLiteral("unusual match: 1 in %1 if on target").arg(qs(words::grouped(1 / matchTail)));
}

QString certaintyText(double pMiss) {
    if (std::isnan(pMiss)) return {};
    return QStringLiteral("P(miss) ") + qs(words::probability(pMiss));
}

QString windowText(const Window& w) { return qs(words::windowTitle(w)); }

QString windowPhrase(const Window& w) { return qs(words::windowName(w)); }

QString dateText(const std::string& isoDate) {
    const QDate d = QDate::fromString(QString::fromStdString(isoDate), Qt::ISODate);
    if (!d.isValid()) return QString::fromStdString(isoDate);
    return QLocale().toString(d, QStringLiteral("ddd d MMM yyyy"));
}

QString compactDateText(const std::string& isoDate) {
    const QDate d = QDate::fromString(QString::fromStdString(isoDate), Qt::ISODate);
    if (!d.isValid()) return QString::fromStdString(isoDate);
    return QLocale().toString(d, QStringLiteral("d MMM yyyy"));
}

QString shortDateText(const std::string& isoDate) {
    const QDate d = QDate::fromString(QString::fromStdString(isoDate), Qt::ISODate);
    if (!d.isValid()) return QString::fromStdString(isoDate);
    return QLocale().toString(d, QStringLiteral("d MMM"));
}

QString venueText(const std::string& venue) {
    if (venue == "home") return QStringLiteral("Home");
    if (venue == "away") return QStringLiteral("Away");
    if (venue == "neutral") return QStringLiteral("Neutral ground");
    return QString::fromStdString(venue);
}

QString scoreText(const MatchSummary& m) {
    if (!m.goalsUs || !m.goalsOpp) return {};
    return QStringLiteral("%1–%2").arg(*m.goalsUs).arg(*m.goalsOpp);
}

QString outcomeText(const MatchSummary& m) {
    if (!m.goalsUs || !m.goalsOpp) return {};
    return *m.goalsUs > *m.goalsOpp ? QStringLiteral("W")
           : *m.goalsUs < *m.goalsOpp ? QStringLiteral("L")
                                      : QStringLiteral("D");
}

QString outcomeWord(const MatchSummary& m) {
    const QString o = outcomeText(m);
    if (o == QLatin1String("W")) return QStringLiteral("Won");
    if (o == QLatin1String("L")) return QStringLiteral("Lost");
    if (o == QLatin1String("D")) return QStringLiteral("Drawn");
    return {};
}

QString kindText(MetricKind kind) {
    switch (kind) {
    case MetricKind::Rate: return QStringLiteral("share of items");
    case MetricKind::Count: return QStringLiteral("count a match");
    case MetricKind::Exposure: return QStringLiteral("per exposure event");
    }
    return {};
}

QString betterText(Better better) {
    return better == Better::Higher ? QStringLiteral("Higher is better")
                                    : QStringLiteral("Lower is better");
}

QString localPath(const QUrl& file) { return file.isLocalFile() ? file.toLocalFile() : file.toString(); }

QString plainMessage(const std::string& text) {
    QStringList lines;
    for (QString line : qs(text).split(QLatin1Char('\n'), Qt::SkipEmptyParts)) {
        for (const QString& prefix : {QStringLiteral("error: "), QStringLiteral("warning: ")})
            if (line.startsWith(prefix)) line = line.mid(prefix.size());
        if (!line.isEmpty()) line[0] = line[0].toUpper();
        lines << line;
    }
    return lines.join(QLatin1Char('\n'));
}

double ScaleDomain::position(double value) const {
    if (std::isnan(value) || high <= low) return 0;
    return std::clamp((value - low) / (high - low), 0.0, 1.0);
}

int ScaleDomain::steps() const {
    return step > 0 ? static_cast<int>(std::lround((high - low) / step)) : 1;
}

ScaleDomain scaleDomain(MetricKind kind, const std::vector<double>& values) {
    constexpr double eps = 1e-9;
    double lo = INFINITY, hi = -INFINITY;
    for (double v : values)
        if (std::isfinite(v)) {
            lo = std::min(lo, v);
            hi = std::max(hi, v);
        }
    if (kind == MetricKind::Rate) {
        if (lo > hi) return {0, 1, 0.2};
        const double span = std::ceil(hi * 10 - eps) / 10 - std::floor(lo * 10 + eps) / 10;
        ScaleDomain d;
        d.step = span <= 0.3 + eps ? 0.05 : span <= 0.6 + eps ? 0.1 : 0.2;
        d.low = std::max(0.0, std::floor(lo / d.step + eps) * d.step);
        d.high = std::min(1.0, std::ceil(hi / d.step - eps) * d.step);
        if (d.high <= d.low + eps) {
            if (d.high + d.step <= 1 + eps) d.high += d.step;
            else d.low -= d.step;
        }
        return d;
    }
    if (lo > hi || hi <= 0) return {0, 1, 0.25};
    ScaleDomain d;
    d.step = tidyStep(hi, 4);
    d.low = 0;
    d.high = std::max(1.0, std::ceil(hi / d.step - eps)) * d.step;
    return d;
}

QStringList scaleLabels(MetricKind kind, const ScaleDomain& domain) {
    QStringList out;
    const int decimals = kind == MetricKind::Rate ? 0 : domain.step >= 1 - 1e-9 ? 0 : domain.step >= 0.1 - 1e-9 ? 1 : 2;
    for (int i = 0; i <= domain.steps(); ++i) {
        const double v = domain.low + domain.step * i;
        out << (kind == MetricKind::Rate ? number(100 * v, decimals) + QLatin1Char('%')
                                         : number(v, decimals));
    }
    return out;
}

} // namespace pitchloop::desktop
