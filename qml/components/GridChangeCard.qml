pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The club's zone grid: the grid in use, another one to choose with a sketch of it, what moving
// there would do in plain words, the move itself (confirmed first, with progress) and its undo,
// and the log of earlier changes.
Card {
    id: root

    required property GridChangeView view

    title: qsTr("Zone grid")

    Label {
        Layout.fillWidth: true
        text: qsTr("In use: %1").arg(root.view.currentText)
        color: Theme.text
        wrapMode: Text.WordWrap
    }

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gapLarge
        GridLayout {
            columns: 2
            columnSpacing: Theme.gap
            rowSpacing: Theme.gapSmall
            Layout.alignment: Qt.AlignTop
            ComboBox {
                id: kindBox
                Layout.columnSpan: 2
                Layout.preferredWidth: 200
                model: [qsTr("Equal sizes"), qsTr("Lanes at the area lines")]
                currentIndex: root.view.kind
                enabled: !root.view.running
                onActivated: index => root.view.kind = index
                ToolTip.visible: hovered
                ToolTip.text: qsTr("Lanes at the area lines: wings, half-spaces and a centre lane cut at the side lines of the penalty and goal areas (Law 1).")
            }
            Label { text: qsTr("Bands"); color: Theme.textMuted }
            SpinBox {
                from: 1
                to: root.view.maxCount
                value: root.view.bands
                editable: true
                enabled: !root.view.running
                Layout.preferredWidth: 110
                onValueModified: root.view.bands = value
            }
            Label { text: qsTr("Lanes"); color: Theme.textMuted }
            SpinBox {
                from: 1
                to: root.view.maxCount
                value: root.view.lanes
                editable: true
                enabled: !root.view.running && root.view.kind === 0
                Layout.preferredWidth: 110
                onValueModified: root.view.lanes = value
            }
        }
        PitchMap {
            id: sketch
            objectName: "gridSketch"
            Layout.fillWidth: true
            Layout.preferredHeight: 130
            geometry: PitchGeometry { id: sketchGeometry; grid: root.view.chosenName }
            showValues: false

            // The chosen grid's zones drawn over the pitch.
            Item {
                x: (sketch.width - sketchGeometry.extentLength * sketch.pxPerMetre) / 2
                y: (sketch.height - sketchGeometry.extentWidth * sketch.pxPerMetre) / 2
                width: sketchGeometry.extentLength * sketch.pxPerMetre
                height: sketchGeometry.extentWidth * sketch.pxPerMetre
                Repeater {
                    model: sketchGeometry.bands * sketchGeometry.lanes
                    delegate: Rectangle {
                        id: cell
                        required property int index
                        readonly property rect area: sketchGeometry.zoneRect(
                            Math.floor(cell.index / sketchGeometry.lanes) + 1, cell.index % sketchGeometry.lanes + 1)
                        x: area.x * sketch.pxPerMetre
                        y: area.y * sketch.pxPerMetre
                        width: area.width * sketch.pxPerMetre
                        height: area.height * sketch.pxPerMetre
                        color: "transparent"
                        border.color: Theme.accentSoft
                        border.width: 1
                    }
                }
            }
        }
    }
    Label {
        Layout.fillWidth: true
        text: qsTr("Bands run along the pitch from our goal line (left in the sketch); lanes across it from our right touchline.")
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        wrapMode: Text.WordWrap
    }

    ColumnLayout {
        visible: root.view.previewLines.length > 0
        Layout.fillWidth: true
        spacing: 2
        Label {
            text: qsTr("Moving to %1 would:").arg(root.view.chosenName)
            color: Theme.text
            font.bold: true
        }
        Repeater {
            model: root.view.previewLines
            delegate: Label {
                required property string modelData
                Layout.fillWidth: true
                text: "• " + modelData
                color: Theme.text
                font.pixelSize: Theme.fontSmall
                wrapMode: Text.WordWrap
            }
        }
        RowLayout {
            Layout.fillWidth: true
            Layout.topMargin: Theme.gapSmall
            spacing: Theme.gap
            TextField {
                Layout.fillWidth: true
                placeholderText: qsTr("Your name (kept with the change)")
                text: root.view.by
                onTextEdited: root.view.by = text
            }
            Button {
                text: qsTr("Keep this grid")
                onClicked: root.view.resetChoice()
            }
            Button {
                text: qsTr("Change the grid…")
                highlighted: true
                enabled: root.view.canChange
                onClicked: confirm.open()
            }
        }
    }

    ColumnLayout {
        visible: root.view.running
        Layout.fillWidth: true
        spacing: 2
        ProgressBar {
            Layout.fillWidth: true
            from: 0
            to: Math.max(1, root.view.total)
            value: root.view.done
            indeterminate: root.view.total === 0
        }
        Label {
            text: root.view.progressText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
        }
    }

    Label {
        visible: root.view.problems.length > 0
        Layout.fillWidth: true
        text: qsTr("Problem: %1").arg(root.view.problems)
        color: Theme.error
        wrapMode: Text.WordWrap
    }
    Label {
        visible: root.view.message.length > 0
        Layout.fillWidth: true
        text: root.view.message
        color: Theme.text
        wrapMode: Text.WordWrap
    }
    Button {
        visible: root.view.canUndo
        text: root.view.undoText
        onClicked: root.view.undo()
    }

    Label {
        visible: root.view.history.length > 0
        Layout.topMargin: Theme.gapSmall
        text: qsTr("Earlier changes")
        color: Theme.textMuted
        font.bold: true
        font.pixelSize: Theme.fontSmall
    }
    Repeater {
        model: root.view.history
        delegate: Label {
            required property string modelData
            Layout.fillWidth: true
            text: modelData
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
        }
    }

    Dialog {
        id: confirm
        objectName: "gridConfirm"
        parent: Overlay.overlay
        anchors.centerIn: parent
        width: Math.min(560, parent ? parent.width - 2 * Theme.margin : 560)
        modal: true
        title: qsTr("Change the zone grid to %1?").arg(root.view.chosenName)
        standardButtons: Dialog.Ok | Dialog.Cancel
        onAccepted: root.view.change()
        ColumnLayout {
            width: parent.width
            spacing: Theme.gapSmall
            Repeater {
                model: root.view.previewLines
                delegate: Label {
                    required property string modelData
                    Layout.fillWidth: true
                    text: "• " + modelData
                    wrapMode: Text.WordWrap
                }
            }
            Label {
                Layout.fillWidth: true
                Layout.topMargin: Theme.gap
                text: qsTr("It is one step: if anything fails, the club file stays as it is. You can move back afterwards.")
                color: Theme.textMuted
                wrapMode: Text.WordWrap
            }
        }
    }
}
