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

    function show(metricId: string, band: int, lane: int, matchId: string) {
        trend.select(metricId, band, lane, matchId)
    }

    background: Rectangle { color: Theme.window }

    ZoneSeries {
        id: trend
        session: root.session
    }

    component Key: Row {
        id: key
        property alias text: label.text
        default property alias swatch: holder.data
        spacing: Theme.gapSmall + 2
        Item {
            id: holder
            width: 26
            height: 14
            anchors.verticalCenter: parent.verticalCenter
        }
        Label {
            id: label
            anchors.verticalCenter: parent.verticalCenter
            color: Theme.text
            font.pixelSize: Theme.fontSmall
        }
    }

    ColumnLayout {
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
                    title: qsTr("%1, %2").arg(trend.metricName).arg(trend.windowText.toLowerCase())
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
                        text: trend.summaryStateText + (trend.summaryCertainty.length > 0 ? "  ·  " + trend.summaryCertainty : "")
                        font.pixelSize: Theme.fontLarge
                        color: Theme.text
                    }
                }
                Label {
                    text: trend.summaryDetail
                    color: Theme.text
                }
                Label {
                    text: trend.summaryTarget
                    color: Theme.text
                }
                Label {
                    Layout.topMargin: Theme.gap
                    text: trend.summaryMatchText
                    color: Theme.textMuted
                }
                Label {
                    text: trend.summaryEwmaText
                    color: Theme.textMuted
                }
                Item { Layout.fillHeight: true }
                Label {
                    Layout.fillWidth: true
                    text: trend.ruleText
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
            title: qsTr("Match by match · %1").arg(trend.seasonText)
            Layout.fillWidth: true
            Layout.fillHeight: true

            SeriesChart {
                Layout.fillWidth: true
                Layout.fillHeight: true
                series: trend.series
                focalRow: trend.focalRow
                windowText: trend.windowText
                ewmaText: trend.ewmaText
                levelText: trend.levelText
            }
            Row {
                spacing: Theme.margin
                Key {
                    text: qsTr("each match")
                    Rectangle {
                        x: 9
                        y: 3
                        width: 8
                        height: 8
                        radius: 4
                        color: "#3b4352"
                    }
                }
                Key {
                    text: qsTr("%1, %2").arg(trend.levelText).arg(trend.windowText.toLowerCase())
                    Rectangle {
                        anchors.fill: parent
                        color: Qt.rgba(0.04, 0.36, 0.6, 0.18)
                    }
                }
                Key {
                    text: trend.ewmaText
                    Rectangle {
                        y: 6
                        width: 26
                        height: 3
                        color: Theme.accent
                    }
                }
                Key {
                    text: qsTr("target")
                    Row {
                        y: 6
                        spacing: 3
                        Repeater {
                            model: 3
                            delegate: Rectangle {
                                width: 6
                                height: 2
                                color: Theme.text
                            }
                        }
                    }
                }
            }
            Row {
                spacing: Theme.margin
                Label {
                    text: qsTr("Judged state over %1 after each match:").arg(trend.windowText.toLowerCase())
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
                Repeater {
                    model: [
                        { state: ZoneState.Slipped, name: qsTr("Slipped") },
                        { state: ZoneState.Watch, name: qsTr("Watch") },
                        { state: ZoneState.OnTarget, name: qsTr("On target") },
                        { state: ZoneState.TooLittleData, name: qsTr("Too little data") }
                    ]
                    delegate: Key {
                        id: stateKey
                        required property var modelData
                        text: modelData.name
                        StateMarker {
                            x: 6
                            zoneState: stateKey.modelData.state
                            size: 13
                        }
                    }
                }
            }
        }
    }
}
