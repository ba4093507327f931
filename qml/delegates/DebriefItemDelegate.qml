import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One debrief line in either layer of words. Plain words: the state, metric and zone, and the
// zone in one sentence ("…6.8 times a match over the last 5 matches; we aim for at most 2. This
// is very unlikely to be bad luck."), the numbers one hover away. Numbers: value with its
// interval and sample, the target, how sure the flag is; the sentence one hover away. Both say
// what changed since the previous match.
ItemDelegate {
    id: root

    required property string metricId
    required property string metricName
    required property int band
    required property int lane
    required property string zoneText
    required property string valueText
    required property string intervalText
    required property string sampleText
    required property string targetText
    required property string certaintyText
    required property int zoneState
    required property string stateText
    required property bool isNew
    required property string changeText
    required property string section
    required property bool firstInSection
    required property string coachText
    required property string analystText
    property bool selected: false
    /// The coach's layer (a sentence) rather than the analyst's (the numbers in columns).
    property bool plainWords: true

    readonly property int lineHeight: plainWords ? 62 : 46
    height: (firstInSection ? 30 : 0) + lineHeight

    /// The other layer, shown on hover.
    readonly property string hoverText: plainWords ? analystText : coachText
    ToolTip.visible: hovered && hoverText.length > 0
    ToolTip.delay: 400
    ToolTip.text: hoverText
    padding: 0
    topPadding: firstInSection ? 30 : 0
    topInset: topPadding
    leftPadding: Theme.gap
    rightPadding: Theme.gap

    // The section's title above its first line.
    Label {
        visible: root.firstInSection
        x: root.leftPadding
        y: 10
        text: root.section
        font.bold: true
        color: Theme.text
    }

    background: Rectangle {
        color: root.selected ? Theme.accentSoft : (root.hovered ? Theme.surfaceAlt : "transparent")
        Rectangle {
            anchors.bottom: parent.bottom
            width: parent.width
            height: 1
            color: Theme.border
            opacity: 0.6
        }
    }

    contentItem: RowLayout {
        spacing: Theme.gap + 4
        StateMarker {
            // Hidden while its row is only partly in view: the software renderer (headless
            // runs) does not clip shapes to the list.
            readonly property Flickable listView: root.ListView.view
            readonly property real rowTop: root.y + root.topPadding + (root.availableHeight - height) / 2
            opacity: !listView || (rowTop >= listView.contentY && rowTop + height <= listView.contentY + listView.height) ? 1 : 0
            zoneState: root.zoneState
            size: 15
        }
        Label {
            Layout.preferredWidth: root.plainWords ? 124 : 92
            text: root.stateText
            color: Theme.text
            font.bold: root.zoneState === ZoneState.OffTarget
        }
        ColumnLayout {
            visible: root.plainWords
            Layout.fillWidth: true
            Layout.minimumWidth: 180
            spacing: 1
            Label {
                Layout.fillWidth: true
                text: root.metricName + "  ·  " + root.zoneText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
            Label {
                objectName: "coachSentence"
                Layout.fillWidth: true
                text: root.coachText
                color: Theme.text
                wrapMode: Text.WordWrap
                maximumLineCount: 2
                elide: Text.ElideRight
            }
        }
        ColumnLayout {
            visible: !root.plainWords
            Layout.fillWidth: true
            Layout.minimumWidth: 180
            spacing: 0
            Label {
                Layout.fillWidth: true
                text: root.metricName
                color: Theme.text
                elide: Text.ElideRight
            }
            Label {
                Layout.fillWidth: true
                text: root.zoneText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
            }
        }
        Label {
            visible: !root.plainWords
            Layout.preferredWidth: 230
            text: root.valueText + "  (" + root.intervalText + ")  " + root.sampleText
            color: Theme.text
            elide: Text.ElideRight
        }
        Label {
            visible: !root.plainWords
            Layout.preferredWidth: 96
            text: root.targetText.length > 0 ? qsTr("target %1").arg(root.targetText) : ""
            color: Theme.textMuted
        }
        Label {
            visible: !root.plainWords
            Layout.preferredWidth: 100
            text: root.certaintyText
            color: Theme.textMuted
        }
        Label {
            Layout.preferredWidth: 140
            text: root.changeText
            color: root.isNew ? Theme.error : Theme.textMuted
            font.bold: root.isNew
            elide: Text.ElideRight
        }
    }
}
