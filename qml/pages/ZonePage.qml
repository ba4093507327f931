pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One zone's trend for one metric over the season: each match's value, the judged window's
// interval, the EWMA and the target, with the judged state after every match. Pick the zone on
// the small pitch or take the whole pitch.
Page {
    id: root

    required property ClubSession session
    /// Plain sentences for the coach, or the analyst's numbers (Main.qml, remembered).
    property bool plainWords: true

    function show(metricId: string, band: int, lane: int, matchId: string) {
        trend.select(metricId, band, lane, matchId)
    }
    /// The same, opening the comparison of two sets of matches (screenshots).
    function showComparison() {
        lowerTabs.currentIndex = 2
    }
    /// The same, opening the moments behind the zone's number.
    function showMoments(metricId: string, band: int, lane: int, matchId: string) {
        show(metricId, band, lane, matchId)
        lowerTabs.currentIndex = 1
    }

    background: Rectangle { color: Theme.window }

    ZoneSeries {
        id: trend
        session: root.session
    }

    ComparisonView {
        id: comparison
        session: root.session
        metricId: trend.metricId
        matchId: trend.matchId
    }

    MomentsView {
        id: moments
        session: root.session
        metricId: trend.metricId
        band: trend.band
        lane: trend.lane
        matchId: trend.matchId
    }

    Label {
        visible: !trend.hasSeries
        anchors.centerIn: parent
        width: Math.min(parent.width - 2 * Theme.margin, 640)
        wrapMode: Text.WordWrap
        horizontalAlignment: Text.AlignHCenter
        text: qsTr("No matches in this club file yet. Load them on the Load matches page (Ctrl+2), or drop the files on this window.")
        color: Theme.text
    }

    ColumnLayout {
        visible: trend.hasSeries
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gapLarge

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                text: qsTr("Metric")
                color: Theme.textMuted
            }
            ComboBox {
                Layout.preferredWidth: 300
                model: root.session.metrics
                textRole: "name"
                valueRole: "metricId"
                currentIndex: trend.metricRow
                onActivated: trend.select(currentValue, trend.band, trend.lane, trend.matchId)
            }
            ComboBox {
                objectName: "zoneScale"
                visible: trend.scalable
                Layout.preferredWidth: 230
                textRole: "text"
                valueRole: "value"
                model: [
                    { text: qsTr("a match"), value: "match" },
                    { text: qsTr("per 90 minutes"), value: "per90" },
                    { text: qsTr("per 100 of their passes"), value: "per_opponent_passes" },
                    { text: qsTr("share of the pitch's total"), value: "share" }
                ]
                currentIndex: Math.max(0, indexOfValue(trend.countScale))
                onActivated: trend.countScale = currentValue
                ToolTip.visible: hovered
                ToolTip.delay: 400
                ToolTip.text: qsTr("What the map shows per; the card, the chart and the flags stay a match")
            }
            Item { Layout.preferredWidth: Theme.gapLarge }
            Button {
                text: qsTr("Whole pitch")
                enabled: trend.band !== 0
                onClicked: trend.select(trend.metricId, 0, 0, trend.matchId)
            }
            Item { Layout.fillWidth: true }
            Label {
                text: trend.seasonText
                color: Theme.textMuted
            }
        }

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.margin

            ColumnLayout {
                spacing: 2
                Label {
                    text: qsTr("Pick a zone · %1 up to %2").arg(trend.windowText.toLowerCase()).arg(trend.matchId)
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
                PitchMap {
                    Layout.preferredWidth: 360
                    Layout.preferredHeight: 226
                    geometry: trend.geometry
                    zones: trend.map
                    selectedBand: trend.band
                    selectedLane: trend.lane
                    onZoneClicked: (band, lane) => trend.select(trend.metricId, band, lane, trend.matchId)
                }
                Legend {
                    Layout.preferredWidth: 360
                    compact: true
                    showStates: false
                    title: trend.scalable ? qsTr("%1 %2, %3").arg(trend.metricName).arg(trend.scaleText).arg(trend.windowText.toLowerCase())
                                          : qsTr("%1, %2").arg(trend.metricName).arg(trend.windowText.toLowerCase())
                    labels: trend.map.scaleLabels
                }
            }

            Card {
                title: trend.zoneText + "  ·  " + trend.metricName
                Layout.fillWidth: true
                Layout.fillHeight: true
                Label {
                    text: trend.summaryTitle
                    color: Theme.textMuted
                }
                RowLayout {
                    spacing: Theme.gapLarge
                    Label {
                        text: trend.summaryValue
                        font.pixelSize: Theme.fontDisplay
                        font.bold: true
                        color: Theme.text
                    }
                    StateMarker {
                        zoneState: trend.summaryState
                        size: 22
                    }
                    Label {
                        text: trend.summaryStateText + (!root.plainWords && trend.summaryCertainty.length > 0
                                                        ? "  ·  " + trend.summaryCertainty : "")
                        font.pixelSize: Theme.fontLarge
                        color: Theme.text
                    }
                }
                Label {
                    objectName: "zoneCoachText"
                    visible: root.plainWords && trend.summaryCoachText.length > 0
                    Layout.fillWidth: true
                    text: trend.summaryCoachText
                    wrapMode: Text.WordWrap
                    color: Theme.text
                }
                Label {
                    visible: !root.plainWords
                    text: trend.summaryDetail
                    color: Theme.text
                }
                Label {
                    visible: !root.plainWords
                    text: trend.summaryTarget
                    color: Theme.text
                }
                Label {
                    Layout.topMargin: Theme.gap
                    text: trend.summaryMatchText
                    color: Theme.textMuted
                }
                Label {
                    objectName: "zonePooledText"
                    visible: trend.summaryPooledText.length > 0
                    text: trend.summaryPooledText
                    color: Theme.textMuted
                }
                Label {
                    visible: !root.plainWords
                    text: trend.summaryEwmaText
                    color: Theme.textMuted
                }
                Item { Layout.fillHeight: true }
                Label {
                    Layout.fillWidth: true
                    text: root.plainWords
                          ? qsTr("A zone is off target only when bad luck is very unlikely to explain it; close to the line when it is on the right side of its target, but only just.")
                          : trend.ruleText
                    wrapMode: Text.WordWrap
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
                Label {
                    Layout.fillWidth: true
                    text: trend.metricQuestion + "  " + trend.betterText + "."
                    wrapMode: Text.WordWrap
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
            }
        }

        Card {
            title: lowerTabs.currentIndex === 0 ? qsTr("Match by match · %1").arg(trend.seasonText)
                   : lowerTabs.currentIndex === 1 ? qsTr("The moments behind the number · %1 · %2").arg(trend.zoneText).arg(trend.metricName)
                                                  : qsTr("Two sets of matches on one map · %1 · %2").arg(trend.metricName).arg(trend.seasonText)
            Layout.fillWidth: true
            Layout.fillHeight: true

            TabBar {
                id: lowerTabs
                objectName: "zoneLowerTabs"
                Layout.preferredWidth: 690
                TabButton { text: qsTr("Match by match") }
                TabButton {
                    objectName: "momentsTab"
                    text: qsTr("The moments behind it (%1)").arg(moments.moments.count)
                }
                TabButton {
                    objectName: "compareTab"
                    text: qsTr("Compare two sets of matches")
                }
            }

            ComparePanel {
                visible: lowerTabs.currentIndex === 2
                Layout.fillWidth: true
                Layout.fillHeight: true
                view: comparison
                geometry: trend.geometry
            }

            MomentsPanel {
                visible: lowerTabs.currentIndex === 1
                Layout.fillWidth: true
                Layout.fillHeight: true
                view: moments
                geometry: trend.geometry
            }

            SeriesChart {
                visible: lowerTabs.currentIndex === 0
                Layout.fillWidth: true
                Layout.fillHeight: true
                series: trend.series
                focalRow: trend.focalRow
                focusSpans: trend.focusSpans
                windowText: trend.windowText
                ewmaText: trend.ewmaText
                levelText: trend.levelText
            }
            SeriesKey {
                visible: lowerTabs.currentIndex === 0
                windowText: trend.windowText
                ewmaText: root.plainWords ? qsTr("Recent form (recent matches count most)") : trend.ewmaText
                levelText: root.plainWords ? qsTr("Likely range") : trend.levelText
            }
            Label {
                visible: lowerTabs.currentIndex === 0
                Layout.fillWidth: true
                text: trend.focusLines.length > 0
                      ? qsTr("Focuses on this zone and metric:\n%1").arg(trend.focusLines.join("\n"))
                      : qsTr("No focus has worked on this zone for this metric this season.")
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                wrapMode: Text.WordWrap
            }
        }
    }
}
