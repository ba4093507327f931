pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import QtQuick.Dialogs
import Pitchloop

// A match judged against the season's targets: one metric on two pitches, this match and the
// judged window, with every zone's state; below, every slipped or watched target of the match,
// most certain first.
Page {
    id: root

    required property ClubSession session
    /// Plain sentences for the coach, or the analyst's numbers (Main.qml, remembered).
    property bool plainWords: true

    signal openZone(string metricId, int band, int lane, string matchId)
    signal openMoments(string metricId, int band, int lane, string matchId)

    function openSelectedMoments(): bool {
        if (debrief.selectedBand <= 0)
            return false
        root.openMoments(debrief.metricId, debrief.selectedBand, debrief.selectedLane, debrief.matchId)
        return true
    }
    signal openFocus(string metricId, int band, int lane, string matchId)

    function showMatch(matchId: string) {
        debrief.matchId = matchId
    }

    background: Rectangle { color: Theme.window }

    function saveAs(kind: string) {
        saveDialog.kind = kind
        saveDialog.selectedFile = debrief.suggestedFileName(kind)
        saveDialog.open()
    }

    FileDialog {
        id: saveDialog
        property string kind: "pdf"
        title: kind === "pdf" ? qsTr("Save the match debrief") : qsTr("Save the numbers as CSV")
        fileMode: FileDialog.SaveFile
        defaultSuffix: kind === "pdf" ? "pdf" : "csv"
        nameFilters: kind === "pdf" ? [qsTr("PDF files (*.pdf)")] : [qsTr("CSV files (*.csv)")]
        onAccepted: {
            if (kind === "pdf")
                debrief.exportPdf(selectedFile)
            else if (kind === "statuses")
                debrief.exportStatusesCsv(selectedFile)
            else
                debrief.exportTalliesCsv(selectedFile)
        }
    }

    MatchDebrief {
        id: debrief
        session: root.session
    }

    component MapPanel: ColumnLayout {
        id: panel
        required property ZoneMapModel zones
        spacing: 2
        Label {
            text: panel.zones.title + "  ·  " + panel.zones.subtitle
            font.pixelSize: Theme.fontLarge
            font.bold: true
            color: Theme.text
        }
        Label {
            text: panel.zones.wholePitchText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
        }
        PitchMap {
            id: map
            Layout.fillWidth: true
            Layout.preferredHeight: 250
            geometry: debrief.geometry
            zones: panel.zones
            selectedBand: debrief.selectedBand
            selectedLane: debrief.selectedLane
            onZoneClicked: (band, lane) => debrief.selectZone(band, lane)
        }
        Label {
            Layout.fillWidth: true
            Layout.preferredHeight: 2 * Theme.fontSmall + 6
            text: map.captionText.length > 0 ? map.captionText : qsTr("Hover a zone for its numbers; click to pick it on both maps.")
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
            maximumLineCount: 2
            elide: Text.ElideRight
        }
    }

    Label {
        visible: !debrief.hasMatch
        anchors.centerIn: parent
        width: Math.min(parent.width - 2 * Theme.margin, 640)
        wrapMode: Text.WordWrap
        horizontalAlignment: Text.AlignHCenter
        text: qsTr("No matches in this club file yet. Load them on the Load matches page (Ctrl+2), or drop the files on this window.")
        color: Theme.text
    }

    ColumnLayout {
        visible: debrief.hasMatch
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gap + 2

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                text: qsTr("Match")
                color: Theme.textMuted
            }
            ComboBox {
                Layout.preferredWidth: 470
                model: root.session.matches
                textRole: "label"
                valueRole: "matchId"
                currentIndex: debrief.matchRow
                onActivated: debrief.matchId = currentValue
            }
            Item { Layout.preferredWidth: Theme.gapLarge }
            Label {
                text: qsTr("Metric")
                color: Theme.textMuted
            }
            ComboBox {
                Layout.preferredWidth: 300
                model: root.session.metrics
                textRole: "name"
                valueRole: "metricId"
                currentIndex: debrief.metricRow
                onActivated: debrief.metricId = currentValue
            }
            // A count's maps read per match, per 90 minutes, per 100 of their passes or as a share.
            ComboBox {
                id: scaleChoice
                objectName: "debriefScale"
                visible: debrief.scalable
                Layout.preferredWidth: 230
                textRole: "text"
                valueRole: "value"
                model: [
                    { text: qsTr("a match"), value: "match" },
                    { text: qsTr("per 90 minutes"), value: "per90" },
                    { text: qsTr("per 100 of their passes"), value: "per_opponent_passes" },
                    { text: qsTr("share of the pitch's total"), value: "share" }
                ]
                currentIndex: Math.max(0, indexOfValue(debrief.countScale))
                onActivated: debrief.countScale = currentValue
                ToolTip.visible: hovered
                ToolTip.delay: 400
                ToolTip.text: qsTr("What the maps show per; the flags always judge the count a match against its target")
            }
            Item { Layout.fillWidth: true }
            // The match's debrief to print or share, and its numbers for a spreadsheet.
            Button {
                id: exportButton
                objectName: "debriefExport"
                text: qsTr("Save or share…")
                onClicked: exportMenu.open()
                Menu {
                    id: exportMenu
                    y: exportButton.height
                    MenuItem {
                        text: qsTr("The debrief as a PDF…")
                        onTriggered: root.saveAs("pdf")
                    }
                    MenuItem {
                        text: qsTr("Every zone's values (CSV)…")
                        onTriggered: root.saveAs("statuses")
                    }
                    MenuItem {
                        text: qsTr("The match's counts per zone (CSV)…")
                        onTriggered: root.saveAs("tallies")
                    }
                }
            }
        }
        Label {
            objectName: "exportMessage"
            visible: debrief.exportMessage.length > 0
            Layout.fillWidth: true
            text: debrief.exportMessage
            color: debrief.exportFailed ? Theme.error : Theme.textMuted
            font.pixelSize: Theme.fontSmall
            elide: Text.ElideMiddle
        }

        Label {
            Layout.fillWidth: true
            text: debrief.metricQuestion + "  " + debrief.betterText + "."
            color: Theme.text
            elide: Text.ElideRight
        }

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.margin
            MapPanel {
                Layout.fillWidth: true
                Layout.preferredWidth: 1
                zones: debrief.matchMap
            }
            MapPanel {
                Layout.fillWidth: true
                Layout.preferredWidth: 1
                zones: debrief.windowMap
            }
        }

        RowLayout {
            Layout.fillWidth: true
            Legend {
                Layout.fillWidth: true
                title: debrief.scalable ? qsTr("%1 %2, both maps").arg(debrief.metricName).arg(debrief.scaleText)
                                        : qsTr("%1, both maps").arg(debrief.metricName)
                labels: debrief.matchMap.scaleLabels
            }
            Button {
                text: debrief.selectedBand > 0
                      ? qsTr("Trend of B%1·L%2").arg(debrief.selectedBand).arg(debrief.selectedLane)
                      : qsTr("Pick a zone for its trend")
                enabled: debrief.selectedBand > 0
                onClicked: root.openZone(debrief.metricId, debrief.selectedBand, debrief.selectedLane, debrief.matchId)
            }
            Button {
                objectName: "debriefMomentsButton"
                text: debrief.selectedBand > 0
                      ? qsTr("Moments of B%1·L%2").arg(debrief.selectedBand).arg(debrief.selectedLane)
                      : qsTr("Moments behind the zone")
                enabled: debrief.selectedBand > 0
                onClicked: root.openMoments(debrief.metricId, debrief.selectedBand, debrief.selectedLane, debrief.matchId)
            }
            Button {
                text: qsTr("Open a focus on it…")
                enabled: debrief.selectedBand > 0
                onClicked: root.openFocus(debrief.metricId, debrief.selectedBand, debrief.selectedLane, debrief.matchId)
            }
        }

        DebriefListCard {
            title: debrief.hasTargets ? qsTr("Zones off target, likely off or close to the line, most certain first")
                                      : qsTr("Targets")
            Layout.fillWidth: true
            Layout.fillHeight: true
            lines: debrief.items
            plainWords: root.plainWords
            note: root.plainWords ? debrief.plainJudgedText : debrief.judgedText
            emptyText: debrief.hasTargets
                       ? qsTr("Nothing off target, likely off or close to the line after this match.")
                       : qsTr("No targets set for this season yet, so nothing is judged; the maps show the values alone.")
            selectedMetric: debrief.metricId
            selectedBand: debrief.selectedBand > 0 ? debrief.selectedBand : -1
            selectedLane: debrief.selectedLane
            onLineClicked: (metricId, band, lane) => {
                debrief.metricId = metricId
                debrief.selectZone(band, lane)
            }
            onLineDoubleClicked: (metricId, band, lane) => root.openZone(metricId, band, lane, debrief.matchId)
        }
    }
}
