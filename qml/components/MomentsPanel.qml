pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import QtQuick.Dialogs
import Pitchloop

// The moments behind the zone's number (docs/moments.md): a list with the match clock and what
// happened, the same moments as arrows on a small pitch, and a clip list for the video with the
// seconds before and after and where the second half starts in the video.
ColumnLayout {
    id: root

    required property MomentsView view
    required property PitchGeometry geometry

    spacing: Theme.gap

    FileDialog {
        id: clipDialog
        property string format: "vtt"
        title: format === "vtt" ? qsTr("Save the moments as video chapters") : qsTr("Save the clip list as CSV")
        fileMode: FileDialog.SaveFile
        defaultSuffix: format
        nameFilters: format === "vtt" ? [qsTr("WebVTT chapters (*.vtt)")] : [qsTr("CSV files (*.csv)")]
        onAccepted: root.view.saveClips(selectedFile, format)
    }

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gap
        ButtonGroup { id: windowChoice }
        RadioButton {
            objectName: "momentsMatchWindow"
            text: root.view.matchWindowText
            checked: !root.view.judgedWindow
            ButtonGroup.group: windowChoice
            onClicked: root.view.judgedWindow = false
        }
        RadioButton {
            objectName: "momentsJudgedWindow"
            text: root.view.judgedWindowText
            checked: root.view.judgedWindow
            ButtonGroup.group: windowChoice
            onClicked: root.view.judgedWindow = true
        }
        ComboBox {
            objectName: "momentsWhose"
            Layout.preferredWidth: 200
            model: root.view.filterChoices
            textRole: "text"
            valueRole: "value"
            currentIndex: Math.max(0, indexOfValue(root.view.filter))
            onActivated: root.view.filter = currentValue
            ToolTip.visible: hovered
            ToolTip.delay: 400
            ToolTip.text: qsTr("Only the moments one of our players, or a unit of ours, took part in (from the squad list in Settings)")
        }
        Label {
            objectName: "momentsSummary"
            Layout.fillWidth: true
            text: root.view.summaryText
            color: Theme.text
            elide: Text.ElideRight
        }
    }

    RowLayout {
        Layout.fillWidth: true
        Layout.fillHeight: true
        spacing: Theme.gapLarge

        ColumnLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            spacing: Theme.gap

            ListView {
                id: list
                objectName: "momentsList"
                Layout.fillWidth: true
                Layout.fillHeight: true
                Layout.minimumHeight: 120
                Layout.minimumWidth: 320
                clip: true
                model: root.view.moments
                currentIndex: -1
                ScrollBar.vertical: ScrollBar {}
                delegate: ItemDelegate {
                    id: row
                    required property int index
                    required property string matchId
                    required property string clockText
                    required property string what
                    required property string countsText
                    required property string playersText
                    width: ListView.view.width
                    height: 38
                    highlighted: ListView.isCurrentItem
                    onClicked: list.currentIndex = index
                    contentItem: RowLayout {
                        spacing: Theme.gap
                        ColumnLayout {
                            spacing: 0
                            Layout.preferredWidth: 132
                            Label {
                                text: row.clockText
                                font.bold: true
                                color: Theme.text
                            }
                            Label {
                                text: row.matchId
                                font.pixelSize: Theme.fontSmall
                                color: Theme.textMuted
                            }
                        }
                        Label {
                            Layout.preferredWidth: 84
                            text: row.countsText
                            color: Theme.textMuted
                        }
                        ColumnLayout {
                            spacing: 0
                            Layout.fillWidth: true
                            Label {
                                Layout.fillWidth: true
                                text: row.what
                                color: Theme.text
                                elide: Text.ElideRight
                                ToolTip.visible: row.hovered
                                ToolTip.delay: 400
                                ToolTip.text: row.what
                            }
                            Label {
                                Layout.fillWidth: true
                                text: row.playersText
                                font.pixelSize: Theme.fontSmall
                                color: Theme.textMuted
                                elide: Text.ElideRight
                            }
                        }
                    }
                }
                Label {
                    anchors.centerIn: parent
                    visible: list.count === 0
                    width: parent.width - 2 * Theme.gap
                    wrapMode: Text.WordWrap
                    horizontalAlignment: Text.AlignHCenter
                    text: qsTr("Nothing happened here that this number counts.")
                    color: Theme.textMuted
                }
            }

            // The clip list for the match video.
            RowLayout {
                Layout.fillWidth: true
                spacing: Theme.gap
                Label { text: qsTr("Clips:"); color: Theme.textMuted }
                TextField {
                    objectName: "leadInField"
                    Layout.preferredWidth: 44
                    text: root.view.leadIn
                    validator: IntValidator { bottom: 0; top: 600 }
                    onEditingFinished: root.view.leadIn = Number(text)
                }
                Label { text: qsTr("s before,"); color: Theme.textMuted }
                TextField {
                    objectName: "leadOutField"
                    Layout.preferredWidth: 44
                    text: root.view.leadOut
                    validator: IntValidator { bottom: 0; top: 600 }
                    onEditingFinished: root.view.leadOut = Number(text)
                }
                Label { text: qsTr("s after · 2nd half at"); color: Theme.textMuted }
                TextField {
                    objectName: "secondHalfField"
                    Layout.preferredWidth: 64
                    placeholderText: qsTr("mm:ss")
                    text: root.view.secondHalfStart
                    onTextEdited: root.view.secondHalfStart = text
                    ToolTip.visible: hovered
                    ToolTip.delay: 400
                    ToolTip.text: qsTr("Where the 2nd half starts in the video; empty: right after the 1st, with the break cut")
                }
                Item { Layout.fillWidth: true }
                Button {
                    objectName: "saveChaptersButton"
                    text: qsTr("Chapters…")
                    enabled: root.view.canSaveClips
                    ToolTip.visible: hovered
                    ToolTip.delay: 400
                    ToolTip.text: qsTr("A WebVTT chapter file: a video player jumps from moment to moment")
                    onClicked: {
                        clipDialog.format = "vtt"
                        clipDialog.selectedFile = root.view.suggestedFileName("vtt")
                        clipDialog.open()
                    }
                }
                Button {
                    text: qsTr("CSV…")
                    ToolTip.visible: hovered
                    ToolTip.delay: 400
                    ToolTip.text: qsTr("The clip list as a table: start and end of each clip in the video")
                    enabled: root.view.canSaveClips
                    onClicked: {
                        clipDialog.format = "csv"
                        clipDialog.selectedFile = root.view.suggestedFileName("csv")
                        clipDialog.open()
                    }
                }
            }
            Label {
                objectName: "clipsMessage"
                Layout.fillWidth: true
                visible: root.view.exportMessage.length > 0 || (root.view.judgedWindow && list.count > 0)
                text: root.view.exportMessage.length > 0
                      ? root.view.exportMessage
                      : qsTr("A clip list is one match's video: choose this match to save one.")
                color: root.view.exportFailed ? Theme.error : Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideMiddle
            }
        }

        ColumnLayout {
            Layout.preferredWidth: 260
            Layout.maximumWidth: 260
            Layout.fillHeight: true
            spacing: Theme.gapSmall
            PitchMap {
                Layout.preferredWidth: 260
                Layout.preferredHeight: 172
                geometry: root.geometry
                arrows: root.view.moments
                highlightedArrow: list.currentIndex
                selectedBand: root.view.band
                selectedLane: root.view.lane
            }
            Label {
                Layout.preferredWidth: 260
                text: qsTr("Solid: counted as yes · dashed: no · we attack left to right. Pick a moment to pick out its arrow.")
                font.pixelSize: Theme.fontSmall
                color: Theme.textMuted
                wrapMode: Text.WordWrap
            }
            Item { Layout.fillHeight: true }
        }
    }
}
