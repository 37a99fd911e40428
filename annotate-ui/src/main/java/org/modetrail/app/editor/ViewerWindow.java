package org.modetrail.app.editor;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;

import javax.swing.AbstractAction;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JSlider;
import javax.swing.JToolBar;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.WindowConstants;

import org.modetrail.video.Frame;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * The editor's window as it stands before the annotation screens land: open a video, see a frame large, scrub and
 * step through frames. Frames are decoded on a worker thread; only the newest request is served, so dragging the
 * slider never queues up decodes.
 */
final class ViewerWindow extends JFrame {
    private final FrameCanvas canvas = new FrameCanvas();
    private final JSlider slider = new JSlider(0, 0, 0);
    private final JLabel status = new JLabel("Open a video to begin (Ctrl+O)");
    private final ExecutorService decoder = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "frame-decoder");
        t.setDaemon(true);
        return t;
    });
    private final AtomicInteger wanted = new AtomicInteger(-1);
    private VideoSource source;

    ViewerWindow(Runnable onClose) {
        super("Modetrail");
        setDefaultCloseOperation(WindowConstants.DISPOSE_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosed(WindowEvent e) {
                closeSource();
                onClose.run();
            }
        });
        JToolBar tools = new JToolBar();
        tools.setFloatable(false);
        JButton open = new JButton("Open video…");
        open.addActionListener(e -> chooseVideo());
        tools.add(open);
        tools.addSeparator();
        tools.add(status);

        slider.setEnabled(false);
        slider.addChangeListener(e -> requestFrame(slider.getValue()));

        JPanel bottom = new JPanel(new BorderLayout());
        bottom.add(slider, BorderLayout.CENTER);

        getContentPane().add(tools, BorderLayout.NORTH);
        getContentPane().add(canvas, BorderLayout.CENTER);
        getContentPane().add(bottom, BorderLayout.SOUTH);
        bindKeys();
        setSize(new Dimension(1000, 720));
        setLocationByPlatform(true);
    }

    private void bindKeys() {
        JComponent root = getRootPane();
        bind(root, "control O", "open", this::chooseVideo);
        bind(root, "RIGHT", "next", () -> step(1));
        bind(root, "LEFT", "previous", () -> step(-1));
        bind(root, "shift RIGHT", "next10", () -> step(10));
        bind(root, "shift LEFT", "previous10", () -> step(-10));
        bind(root, "HOME", "first", () -> slider.setValue(0));
        bind(root, "END", "last", () -> slider.setValue(slider.getMaximum()));
    }

    private static void bind(JComponent c, String key, String name, Runnable action) {
        c.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(KeyStroke.getKeyStroke(key), name);
        c.getActionMap().put(name, new AbstractAction() {
            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                action.run();
            }
        });
    }

    private void step(int delta) {
        if (slider.isEnabled()) {
            slider.setValue(Math.max(0, Math.min(slider.getMaximum(), slider.getValue() + delta)));
        }
    }

    private void chooseVideo() {
        JFileChooser chooser = new JFileChooser();
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            openVideo(chooser.getSelectedFile().toPath());
        }
    }

    void openVideo(Path path) {
        status.setText("Opening " + path.getFileName() + "…");
        decoder.submit(() -> {
            try {
                VideoSource opened = VideoSource.open(path);
                SwingUtilities.invokeLater(() -> showOpened(opened));
            } catch (VideoException e) {
                SwingUtilities.invokeLater(() -> {
                    status.setText("Could not open " + path.getFileName());
                    JOptionPane.showMessageDialog(this, e.getMessage(), "Cannot open video",
                            JOptionPane.ERROR_MESSAGE);
                });
            }
        });
    }

    private void showOpened(VideoSource opened) {
        closeSource();
        source = opened;
        setTitle("Modetrail — " + opened.path().getFileName());
        slider.setMaximum(opened.frameCount() - 1);
        slider.setEnabled(true);
        slider.setValue(0);
        requestFrame(0);
    }

    private void requestFrame(int n) {
        VideoSource s = source;
        if (s == null) {
            return;
        }
        wanted.set(n);
        decoder.submit(() -> {
            if (wanted.get() != n) {
                return; // a newer request is queued
            }
            try {
                Frame f = s.frame(n);
                BufferedImage img = new BufferedImage(f.width(), f.height(), BufferedImage.TYPE_INT_RGB);
                img.setRGB(0, 0, f.width(), f.height(), f.rgb(), 0, f.width());
                String text = String.format(Locale.ROOT, "frame %d (0–%d) · %.3f s · %dx%d · %s", n,
                        s.frameCount() - 1, f.timeSeconds(), f.width(), f.height(), s.info().codec());
                SwingUtilities.invokeLater(() -> {
                    canvas.show(img);
                    status.setText(text);
                });
            } catch (VideoException e) {
                SwingUtilities.invokeLater(() -> status.setText(e.getMessage()));
            }
        });
    }

    private void closeSource() {
        VideoSource s = source;
        source = null;
        if (s != null) {
            decoder.submit(s::close);
        }
    }

    /** Draws the current frame as large as fits, keeping its aspect ratio. */
    private static final class FrameCanvas extends JComponent {
        private BufferedImage image;

        void show(BufferedImage img) {
            image = img;
            repaint();
        }

        @Override
        protected void paintComponent(Graphics g) {
            Graphics2D g2 = (Graphics2D) g.create();
            Color back = UIManager.getColor("Panel.background");
            g2.setColor(back != null ? back.darker() : Color.DARK_GRAY);
            g2.fillRect(0, 0, getWidth(), getHeight());
            if (image != null) {
                double scale = Math.min(getWidth() / (double) image.getWidth(),
                        getHeight() / (double) image.getHeight());
                int w = (int) Math.round(image.getWidth() * scale);
                int h = (int) Math.round(image.getHeight() * scale);
                g2.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
                g2.drawImage(image, (getWidth() - w) / 2, (getHeight() - h) / 2, w, h, null);
            }
            g2.dispose();
        }
    }

}
