// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { useFormik } from "formik";
import { afterEach, describe, expect, test } from "vitest";
import * as yup from "yup";
import { NumberWithUnitField, SelectField, TextField } from "@/components/ui/field";

afterEach(cleanup);

describe("TextField", () => {
  test("is labeled, and its hint and error are announced with it", () => {
    render(<TextField label="Job name" name="name" hint="As the crew knows it" error="Job name is required" />);
    const input = screen.getByLabelText("Job name");
    expect(input.getAttribute("aria-invalid")).toBe("true");
    const describedBy = (input.getAttribute("aria-describedby") ?? "").split(" ");
    const texts = describedBy.map((id) => document.getElementById(id)?.textContent);
    expect(texts).toEqual(["As the crew knows it", "Job name is required"]);
  });

  test("without an error it is not marked invalid", () => {
    render(<TextField label="Site address" name="address" error={false} />);
    const input = screen.getByLabelText("Site address");
    expect(input.getAttribute("aria-invalid")).toBeNull();
    expect(input.getAttribute("aria-describedby")).toBeNull();
  });
});

describe("NumberWithUnitField", () => {
  test("shows its unit and reads it with the field", () => {
    render(<NumberWithUnitField label="Dead load" name="dead" unit="psf" unitSpoken="pounds per square foot" defaultValue="10" />);
    const input = screen.getByLabelText("Dead load");
    expect(input.getAttribute("inputmode")).toBe("decimal");
    expect(screen.getByText("psf")).toBeTruthy();
    const unitId = (input.getAttribute("aria-describedby") ?? "").split(" ")[0];
    expect(document.getElementById(unitId)?.textContent).toContain("pounds per square foot");
  });
});

describe("SelectField", () => {
  test("lists its options after the placeholder", () => {
    render(
      <SelectField
        label="Species and grade"
        name="species"
        placeholder="Choose one"
        options={[
          { value: "df-l-2", label: "Douglas Fir-Larch No.2" },
          { value: "spf-2", label: "Spruce-Pine-Fir No.2" },
        ]}
      />,
    );
    const select = screen.getByLabelText<HTMLSelectElement>("Species and grade");
    expect(Array.from(select.options).map((option) => option.textContent)).toEqual(["Choose one", "Douglas Fir-Larch No.2", "Spruce-Pine-Fir No.2"]);
  });
});

function SpanForm() {
  const formik = useFormik({
    initialValues: { span: "" },
    validationSchema: yup.object({ span: yup.string().required("Span is required") }),
    onSubmit: () => undefined,
  });
  return (
    <form onSubmit={formik.handleSubmit} noValidate>
      <TextField label="Span" {...formik.getFieldProps("span")} error={formik.touched.span ? formik.errors.span : undefined} />
      <button type="submit">Next</button>
    </form>
  );
}

describe("with formik", () => {
  test("takes getFieldProps as they are and shows formik's error beside the field", async () => {
    render(<SpanForm />);
    fireEvent.click(screen.getByRole("button", { name: "Next" }));
    const error = await screen.findByText("Span is required");
    const input = screen.getByLabelText("Span");
    expect(input.getAttribute("aria-describedby")).toBe(error.parentElement?.id);
    fireEvent.change(input, { target: { value: "12' 6\"" } });
    expect((input as HTMLInputElement).value).toBe("12' 6\"");
  });
});
